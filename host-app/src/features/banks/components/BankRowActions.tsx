import type { BankDto } from '@covalent/shared-types';
import { Button, Flex } from '@radix-ui/themes';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import type { BankAction } from '../hooks/useBankActions';

export interface BankRowActionsProps {
  bank: BankDto;
  busy: boolean;
  onAction: (action: BankAction) => void;
}

/** Duplicate for anyone who can read the bank; archive and delete for its owner. */
export function BankRowActions({ bank, busy, onAction }: BankRowActionsProps) {
  const owner = bank.access === 'owner';
  return (
    <Flex gap="2" wrap="wrap" justify="end">
      <Button size="1" variant="soft" disabled={busy} aria-label={`Duplicate ${bank.title}`} onClick={() => onAction('duplicate')}>
        Duplicate
      </Button>
      {owner && (
        <Button
          size="1"
          variant="soft"
          color="gray"
          disabled={busy}
          aria-label={`${bank.archivedAt ? 'Unarchive' : 'Archive'} ${bank.title}`}
          onClick={() => onAction(bank.archivedAt ? 'unarchive' : 'archive')}
        >
          {bank.archivedAt ? 'Unarchive' : 'Archive'}
        </Button>
      )}
      {owner && (
        <ConfirmButton
          label="Delete"
          ariaLabel={`Delete ${bank.title}`}
          disabled={busy}
          title={`Delete “${bank.title}”?`}
          description={`Its ${bank.itemCount} items go with it, and this cannot be undone. Archive the bank instead to keep it out of the way.`}
          confirmLabel="Delete bank"
          onConfirm={() => onAction('delete')}
        />
      )}
    </Flex>
  );
}
