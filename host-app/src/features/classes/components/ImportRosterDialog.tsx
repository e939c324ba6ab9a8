import { Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { CsvImportDialog } from '@/features/csv-import/components/CsvImportDialog';
import type { RosterImportInput } from '../hooks/useClassMutations';

export interface ImportRosterDialogProps {
  onImport: (input: RosterImportInput) => Promise<unknown>;
}

const MODES = [
  { value: 'append', label: 'Add to the roster', hint: 'Names already on the roster are reported, not doubled.' },
  { value: 'replace', label: 'Replace the whole roster', hint: 'Students not in the file are removed, with their pair rules.' },
] as const;

/** A roster from a spreadsheet with columns display_name, table_group, seat_number, time_multiplier. */
export function ImportRosterDialog({ onImport }: ImportRosterDialogProps) {
  const [mode, setMode] = useState<RosterImportInput['mode']>('append');
  return (
    <CsvImportDialog
      triggerLabel="Import roster CSV"
      title="Import a roster from CSV"
      description="Columns: display_name, table_group, seat_number, time_multiplier (1, 1.25, 1.5 or 2; empty means 1)."
      onImport={(file) => onImport({ file, mode })}
    >
      <fieldset className="plain-fieldset">
        <legend>
          <Text size="2" weight="bold">
            What to do with the file
          </Text>
        </legend>
        <Flex direction="column" gap="2" mt="2">
          {MODES.map((m) => (
            <Text as="label" key={m.value} size="2">
              <Flex gap="2" align="start">
                <input type="radio" name="roster-import-mode" value={m.value} checked={mode === m.value} onChange={() => setMode(m.value)} />
                <span>
                  <Text weight="bold">{m.label}</Text>
                  <br />
                  <Text color="gray">{m.hint}</Text>
                </span>
              </Flex>
            </Text>
          ))}
        </Flex>
      </fieldset>
    </CsvImportDialog>
  );
}
