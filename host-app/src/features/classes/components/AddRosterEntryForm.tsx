import { Button, Flex } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import type { RosterEntryInput } from '../hooks/useClassMutations';
import { emptyRosterRow, rosterEntryInput } from '../utils/rosterEntryInput';
import { RosterRowFields } from './RosterRowFields';

export interface AddRosterEntryFormProps {
  pending: boolean;
  error: ApiRequestError | null;
  onAdd: (input: RosterEntryInput, done: () => void) => void;
}

/** One student at a time; the name field is ready again straight after. */
export function AddRosterEntryForm({ pending, error, onAdd }: AddRosterEntryFormProps) {
  const [draft, setDraft] = useState(emptyRosterRow);
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    // Keep the table group: students are usually entered table by table.
    onAdd(rosterEntryInput(draft), () => setDraft({ ...emptyRosterRow, tableGroup: draft.tableGroup }));
  };
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a student">
      <Flex direction="column" gap="3">
        <FormErrorCallout message={error && !error.body.details?.length ? error.message : undefined} />
        <Flex gap="3" wrap="wrap" align="end">
          <RosterRowFields draft={draft} onChange={setDraft} error={error} />
          <Button type="submit" loading={pending}>
            Add student
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
