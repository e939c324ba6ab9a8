import type { BankDto } from '@covalent/shared-types';
import { Button, Flex, Grid, Text, TextArea } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { useUpdateBank } from '../hooks/useUpdateBank';
import { splitList } from '../utils/splitList';

export interface BankDetailsFormProps {
  bank: BankDto;
  readOnly: boolean;
}

/** Title, description, tags and standards code of a bank. */
export function BankDetailsForm({ bank, readOnly }: BankDetailsFormProps) {
  const [title, setTitle] = useState(bank.title);
  const [description, setDescription] = useState(bank.description);
  const [tags, setTags] = useState(bank.tags.join(', '));
  const [standardsCode, setStandardsCode] = useState(bank.standardsCode ?? '');
  const update = useUpdateBank(bank.id);
  const fieldMessages = (field: string) => update.error?.fieldMessages(field) ?? [];
  const placed = ['title', 'description', 'tags', 'standardsCode'];
  const unplaced = update.error && !update.error.body.details?.every((d) => placed.includes(d.field));

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    update.mutate({ title: title.trim(), description: description.trim(), tags: splitList(tags), standardsCode: standardsCode.trim() || null });
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Bank details">
      <fieldset disabled={readOnly} className="plain-fieldset">
        <Flex direction="column" gap="4">
          <FormErrorCallout message={unplaced ? update.error?.message : undefined} />
          <Grid columns={{ initial: '1', sm: '2' }} gap="4">
            <FormField label="Title" value={title} onChange={(e) => setTitle(e.target.value)} errors={fieldMessages('title')} />
            <FormField
              label="Standards code (optional)"
              value={standardsCode}
              onChange={(e) => setStandardsCode(e.target.value)}
              errors={fieldMessages('standardsCode')}
            />
          </Grid>
          <FieldFrame label="Description" errors={fieldMessages('description')}>
            {(control) => <TextArea {...control} size="3" rows={2} value={description} onChange={(e) => setDescription(e.target.value)} />}
          </FieldFrame>
          <FormField
            label="Bank tags"
            hint="Separate with commas. Tag a bank “safety” for lab-safety review."
            value={tags}
            onChange={(e) => setTags(e.target.value)}
            errors={fieldMessages('tags')}
          />
          {!readOnly && (
            <Flex gap="3" align="center">
              <Button type="submit" loading={update.isPending}>
                Save details
              </Button>
              {update.isSuccess && (
                <Text size="2" color="gray" role="status">
                  Saved.
                </Text>
              )}
            </Flex>
          )}
        </Flex>
      </fieldset>
    </form>
  );
}
