import { TextField, Text, Flex } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { CsvImportDialog } from '@/features/csv-import/components/CsvImportDialog';
import { routes } from '@/routes';
import { useImportBank } from '../hooks/useImportBank';

/** A new bank from a spreadsheet in Covalent's bank layout (docs/bank-csv.md). */
export function ImportBankDialog() {
  const importBank = useImportBank();
  const navigate = useNavigate();
  const [title, setTitle] = useState('');
  const id = useId();

  return (
    <CsvImportDialog
      triggerLabel="Import CSV"
      title="Import a bank from CSV"
      description="Use the bank layout: one row per item, with columns type, prompt, option_a … option_h, correct and the rest. Save from your spreadsheet as “CSV UTF-8”."
      onImport={async (file) => {
        const result = await importBank.mutateAsync({ file, title: title.trim() || undefined });
        setTitle('');
        navigate(routes.bank.build(result.targetId));
      }}
    >
      <Flex direction="column" gap="1">
        <Text as="label" htmlFor={id} size="2" weight="bold">
          Bank title (optional)
        </Text>
        <TextField.Root id={id} size="3" value={title} onChange={(e) => setTitle(e.target.value)} placeholder="Taken from the file name when empty" />
      </Flex>
    </CsvImportDialog>
  );
}
