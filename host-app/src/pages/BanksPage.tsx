import type { BankSort } from '@covalent/shared-types';
import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { BankListFilters } from '@/features/banks/components/BankListFilters';
import { BanksTable } from '@/features/banks/components/BanksTable';
import { CreateBankForm } from '@/features/banks/components/CreateBankForm';
import { ImportBankDialog } from '@/features/banks/components/ImportBankDialog';
import { useBankActions } from '@/features/banks/hooks/useBankActions';
import { useBanks } from '@/features/banks/hooks/useBanks';
import { useDebouncedValue } from '@/features/banks/hooks/useDebouncedValue';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';

/** Titles read best A→Z; counts and dates most-first. */
const defaultDir = (sort: BankSort): 'asc' | 'desc' => (sort === 'title' ? 'asc' : 'desc');

export function BanksPage() {
  const [search, setSearch] = useState('');
  const [tag, setTag] = useState('');
  const [showArchived, setShowArchived] = useState(false);
  const [sort, setSort] = useState<BankSort>('updatedAt');
  const [dir, setDir] = useState<'asc' | 'desc'>('desc');
  const q = useDebouncedValue(search.trim());
  const tagFilter = useDebouncedValue(tag.trim());
  const banks = useBanks({ q, tag: tagFilter, archived: showArchived ? 'all' : 'false', sort, dir });
  const actions = useBankActions();
  const filtered = q !== '' || tagFilter !== '';

  const onSort = (key: BankSort) => {
    if (key === sort) setDir(dir === 'asc' ? 'desc' : 'asc');
    else {
      setSort(key);
      setDir(defaultDir(key));
    }
  };

  return (
    <Flex direction="column" gap="5">
      <PageHeader title="Banks" description="Collections of review items, one topic each. Reuse them across periods and terms." />
      <Card size="3">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="4">
            Start a bank
          </Heading>
          <CreateBankForm />
          <Flex gap="3" align="center" wrap="wrap">
            <Text size="2" color="gray">
              Or bring one in from a spreadsheet:
            </Text>
            <ImportBankDialog />
          </Flex>
        </Flex>
      </Card>
      <BankListFilters
        search={search}
        tag={tag}
        showArchived={showArchived}
        onSearch={setSearch}
        onTag={setTag}
        onShowArchived={setShowArchived}
      />
      <FormErrorCallout message={actions.error?.message} />
      {banks.isPending && <PageFallback label="Loading banks…" />}
      {banks.isError && (
        <Flex direction="column" gap="3" align="start">
          <FormErrorCallout message={banks.error.message} />
          <Button variant="soft" onClick={() => void banks.refetch()}>
            Try again
          </Button>
        </Flex>
      )}
      {banks.isSuccess &&
        (banks.data.length === 0 ? (
          <EmptyState title={filtered ? 'No banks match' : 'No banks yet'}>
            {filtered
              ? 'Try another title or tag, or clear the filters.'
              : 'A bank holds review items on one topic. Create one above or import a spreadsheet.'}
          </EmptyState>
        ) : (
          <BanksTable
            banks={banks.data}
            sort={sort}
            dir={dir}
            onSort={onSort}
            busyBankId={actions.isPending ? actions.variables?.bankId : undefined}
            onAction={(bank, action) => actions.mutate({ bankId: bank.id, action })}
          />
        ))}
    </Flex>
  );
}
