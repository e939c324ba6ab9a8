import { Badge, Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { apiPaths } from '@/api/apiPaths';
import { BankDetailsForm } from '@/features/banks/components/BankDetailsForm';
import { ItemForm } from '@/features/banks/components/ItemForm';
import { ItemList } from '@/features/banks/components/ItemList';
import { SafetyCaution } from '@/features/banks/components/SafetyCaution';
import { ShareBankDialog } from '@/features/banks/components/ShareBankDialog';
import { useBank } from '@/features/banks/hooks/useBank';
import { useDeleteItem } from '@/features/banks/hooks/useDeleteItem';
import { useImportItems } from '@/features/banks/hooks/useImportItems';
import { useReorderItems } from '@/features/banks/hooks/useReorderItems';
import { bankAccessLabel, canEditBank } from '@/features/banks/utils/bankAccessLabel';
import { isSafetyTagged } from '@/features/banks/utils/isSafetyTagged';
import { CsvImportDialog } from '@/features/csv-import/components/CsvImportDialog';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

type Editing = { kind: 'new' } | { kind: 'item'; itemId: string } | null;

export function BankEditorPage() {
  const { bankId = '' } = useParams();
  const bank = useBank(bankId);
  const reorder = useReorderItems(bankId);
  const deleteItem = useDeleteItem(bankId);
  const importItems = useImportItems(bankId);
  const [editing, setEditing] = useState<Editing>(null);
  const [notice, setNotice] = useState('');

  if (bank.isPending) return <PageFallback label="Loading bank…" />;
  if (bank.isError) {
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Bank" />
        <FormErrorCallout message={bank.error.message} />
        <Button asChild variant="soft">
          <Link to={routes.banks.build()}>Back to banks</Link>
        </Button>
      </Flex>
    );
  }

  const data = bank.data;
  const canEdit = canEditBank(data.access);
  const editingItem = editing?.kind === 'item' ? data.items.find((i) => i.id === editing.itemId) : undefined;
  const editingIndex = editingItem ? data.items.indexOf(editingItem) : -1;
  const safety = isSafetyTagged(data.title, [data.tags, ...data.items.map((i) => i.tags)]);

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title={data.title}
        description={
          <Flex as="span" gap="2" align="center" wrap="wrap">
            <Badge color={data.access === 'owner' ? 'teal' : 'gray'} variant="soft">
              {bankAccessLabel(data)}
            </Badge>
            {data.archivedAt && (
              <Badge color="gray" variant="outline">
                Archived
              </Badge>
            )}
            <span>
              {data.itemCount} {data.itemCount === 1 ? 'item' : 'items'}
            </span>
          </Flex>
        }
      />
      <Flex gap="3" wrap="wrap" align="center">
        <Button asChild variant="soft">
          <a href={apiPaths.bankExport(data.id)} download>
            Export CSV
          </a>
        </Button>
        {data.access === 'owner' && <ShareBankDialog bank={data} />}
        {canEdit && (
          <CsvImportDialog
            triggerLabel="Add items from CSV"
            title="Add items from a CSV file"
            description="The rows are added after the bank's items, in the bank CSV layout (the same as Export CSV)."
            onImport={async (file) => {
              const result = await importItems.mutateAsync(file);
              setNotice(`${result.imported} items added.`);
            }}
          />
        )}
        <Button asChild variant="ghost" color="gray">
          <Link to={routes.banks.build()}>All banks</Link>
        </Button>
      </Flex>
      {notice && (
        <Text role="status" size="2" color="gray">
          {notice}
        </Text>
      )}
      {!canEdit && (
        <Text as="p" color="gray">
          You can read this bank and run sessions from it, but not change it.
        </Text>
      )}
      {safety && <SafetyCaution />}

      <Card size="3">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="4">
            Details
          </Heading>
          <BankDetailsForm key={data.id} bank={data} readOnly={!canEdit} />
        </Flex>
      </Card>

      <Flex direction="column" gap="3">
        <Flex justify="between" align="center" gap="3" wrap="wrap">
          <Heading as="h2" size="4">
            Items
          </Heading>
          {canEdit && (
            <Button onClick={() => setEditing({ kind: 'new' })} disabled={editing?.kind === 'new'}>
              New item
            </Button>
          )}
        </Flex>
        <FormErrorCallout message={reorder.error?.message ?? deleteItem.error?.message} />
        {data.items.length === 0 ? (
          <EmptyState title="No items yet">
            {canEdit ? 'Add the first item with “New item”, or add items from a CSV file.' : 'The owner has not added items yet.'}
          </EmptyState>
        ) : (
          <ItemList
            items={data.items}
            canEdit={canEdit}
            busy={reorder.isPending || deleteItem.isPending}
            onOpen={(item) => setEditing({ kind: 'item', itemId: item.id })}
            onReorder={(ids) => reorder.mutate(ids)}
            onDelete={(item) => {
              if (editing?.kind === 'item' && editing.itemId === item.id) setEditing(null);
              deleteItem.mutate(item.id);
            }}
          />
        )}
      </Flex>

      {editing?.kind === 'new' && (
        <ItemForm key="new" bankId={data.id} heading="New item" readOnly={false} onClose={() => setEditing(null)} />
      )}
      {editingItem && (
        <ItemForm
          key={editingItem.id}
          bankId={data.id}
          item={editingItem}
          heading={`Item ${editingIndex + 1}`}
          readOnly={!canEdit}
          onClose={() => setEditing(null)}
        />
      )}
    </Flex>
  );
}
