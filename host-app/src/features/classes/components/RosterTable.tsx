import type { RosterEntryDto } from '@covalent/shared-types';
import { Button, Flex, Table, TextField } from '@radix-ui/themes';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { ApiRequestError } from '@/api/client';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { routes } from '@/routes';
import type { RosterEntryInput } from '../hooks/useClassMutations';
import { rosterEntryInput, type RosterRowDraft } from '../utils/rosterEntryInput';
import { timeMultiplierLabel } from '../utils/timeMultiplierOptions';
import { TimeMultiplierSelect } from './TimeMultiplierSelect';

export interface RosterTableProps {
  roster: RosterEntryDto[];
  canEdit: boolean;
  saving: boolean;
  saveError: ApiRequestError | null;
  onSave: (entryId: string, input: RosterEntryInput, done: () => void) => void;
  onRemove: (entry: RosterEntryDto) => void;
}

const toDraft = (e: RosterEntryDto): RosterRowDraft => ({
  displayName: e.displayName,
  tableGroup: e.tableGroup ?? '',
  seatNumber: e.seatNumber === null ? '' : String(e.seatNumber),
  timeMultiplier: e.timeMultiplier,
});

/** The roster as rows; one row at a time turns into fields for editing. */
export function RosterTable({ roster, canEdit, saving, saveError, onSave, onRemove }: RosterTableProps) {
  const [editingId, setEditingId] = useState<string | null>(null);
  const [draft, setDraft] = useState<RosterRowDraft | null>(null);
  const startEdit = (entry: RosterEntryDto) => {
    setEditingId(entry.id);
    setDraft(toDraft(entry));
  };
  const stopEdit = () => {
    setEditingId(null);
    setDraft(null);
  };

  return (
    <Flex direction="column" gap="3">
      {editingId && <FormErrorCallout message={saveError?.message} />}
      <Table.Root variant="surface">
        <caption className="visually-hidden">Roster</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Display name</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Table group</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Seat</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Time</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>
              <span className="visually-hidden">History</span>
            </Table.ColumnHeaderCell>
            {canEdit && (
              <Table.ColumnHeaderCell>
                <span className="visually-hidden">Actions</span>
              </Table.ColumnHeaderCell>
            )}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {roster.map((entry) =>
            editingId === entry.id && draft ? (
              <Table.Row key={entry.id}>
                <Table.Cell>
                  <TextField.Root aria-label={`Display name of ${entry.displayName}`} value={draft.displayName} onChange={(e) => setDraft({ ...draft, displayName: e.target.value })} />
                </Table.Cell>
                <Table.Cell>
                  <TextField.Root aria-label={`Table group of ${entry.displayName}`} value={draft.tableGroup} onChange={(e) => setDraft({ ...draft, tableGroup: e.target.value })} />
                </Table.Cell>
                <Table.Cell>
                  <TextField.Root
                    aria-label={`Seat number of ${entry.displayName}`}
                    inputMode="numeric"
                    value={draft.seatNumber}
                    onChange={(e) => setDraft({ ...draft, seatNumber: e.target.value })}
                  />
                </Table.Cell>
                <Table.Cell>
                  <TimeMultiplierSelect
                    aria-label={`Time multiplier of ${entry.displayName}`}
                    value={draft.timeMultiplier}
                    onChange={(timeMultiplier) => setDraft({ ...draft, timeMultiplier })}
                  />
                </Table.Cell>
                <Table.Cell />
                <Table.Cell>
                  <Flex gap="2">
                    <Button size="1" loading={saving} onClick={() => onSave(entry.id, rosterEntryInput(draft), stopEdit)}>
                      Save
                    </Button>
                    <Button size="1" variant="soft" color="gray" onClick={stopEdit}>
                      Cancel
                    </Button>
                  </Flex>
                </Table.Cell>
              </Table.Row>
            ) : (
              <Table.Row key={entry.id}>
                <Table.RowHeaderCell>{entry.displayName}</Table.RowHeaderCell>
                <Table.Cell>{entry.tableGroup ?? '—'}</Table.Cell>
                <Table.Cell>{entry.seatNumber ?? '—'}</Table.Cell>
                <Table.Cell>{timeMultiplierLabel(entry.timeMultiplier)}</Table.Cell>
                <Table.Cell>
                  <Link to={routes.studentHistory.build(entry.classId, entry.id)} aria-label={`History for ${entry.displayName}`}>
                    History
                  </Link>
                </Table.Cell>
                {canEdit && (
                  <Table.Cell>
                    <Flex gap="2" justify="end">
                      <Button size="1" variant="soft" aria-label={`Edit ${entry.displayName}`} onClick={() => startEdit(entry)}>
                        Edit
                      </Button>
                      <ConfirmButton
                        label="Remove"
                        ariaLabel={`Remove ${entry.displayName}`}
                        title={`Remove ${entry.displayName} from the roster?`}
                        description="Their pair rules go with them. Results of past sessions are kept."
                        confirmLabel="Remove student"
                        onConfirm={() => onRemove(entry)}
                      />
                    </Flex>
                  </Table.Cell>
                )}
              </Table.Row>
            ),
          )}
        </Table.Body>
      </Table.Root>
    </Flex>
  );
}
