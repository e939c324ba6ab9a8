import { Button, Dialog, Flex, Text } from '@radix-ui/themes';
import { useState, type FormEvent, type ReactNode } from 'react';
import { ApiRequestError } from '@/api/client';
import { FileInput } from '@/features/forms/components/FileInput';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { ImportErrorReport } from './ImportErrorReport';

export interface CsvImportDialogProps {
  triggerLabel: string;
  title: string;
  description: ReactNode;
  /** Extra fields beside the file (a title, a mode). */
  children?: ReactNode;
  /** Sends the file; resolves when imported, rejects with the server's error. */
  onImport: (file: File) => Promise<unknown>;
  disabled?: boolean;
}

/** Choose a CSV file, send it, and on refusal show the server's row-and-column report. */
export function CsvImportDialog({ triggerLabel, title, description, children, onImport, disabled }: CsvImportDialogProps) {
  const [open, setOpen] = useState(false);
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<ApiRequestError | null>(null);
  const [pending, setPending] = useState(false);

  const reset = (next: boolean) => {
    setOpen(next);
    if (!next) {
      setFile(null);
      setError(null);
    }
  };

  const onSubmit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!file) return;
    setPending(true);
    setError(null);
    try {
      await onImport(file);
      reset(false);
    } catch (e) {
      setError(e instanceof ApiRequestError ? e : null);
    } finally {
      setPending(false);
    }
  };

  return (
    <Dialog.Root open={open} onOpenChange={reset}>
      <Dialog.Trigger>
        <Button variant="soft" disabled={disabled}>
          {triggerLabel}
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="600px">
        <Dialog.Title>{title}</Dialog.Title>
        <Dialog.Description size="3" color="gray">
          {description}
        </Dialog.Description>
        <Flex asChild direction="column" gap="4" mt="4">
          <form onSubmit={(e) => void onSubmit(e)} noValidate>
            {children}
            <FileInput label="CSV file" accept=".csv,text/csv" onFile={(f) => { setFile(f); setError(null); }} />
            {error && (error.body.details?.length ? <ImportErrorReport error={error.body} /> : <FormErrorCallout message={error.message} />)}
            {!file && !error && (
              <Text size="2" color="gray">
                Every row is checked before anything is saved.
              </Text>
            )}
            <Flex gap="3" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" disabled={!file} loading={pending}>
                Import
              </Button>
            </Flex>
          </form>
        </Flex>
      </Dialog.Content>
    </Dialog.Root>
  );
}
