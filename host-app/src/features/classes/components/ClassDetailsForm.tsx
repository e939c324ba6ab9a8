import type { ClassDto } from '@covalent/shared-types';
import { Button, Flex, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import type { ClassDetailsInput } from '../hooks/useCreateClass';
import { ClassDetailsFields } from './ClassDetailsFields';

export interface ClassDetailsFormProps {
  cls: ClassDto;
  pending: boolean;
  saved: boolean;
  error: ApiRequestError | null;
  onSave: (input: ClassDetailsInput) => void;
}

export function ClassDetailsForm({ cls, pending, saved, error, onSave }: ClassDetailsFormProps) {
  const [value, setValue] = useState<ClassDetailsInput>({ name: cls.name, period: cls.period, term: cls.term });
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onSave({ name: value.name.trim(), period: value.period.trim(), term: value.term.trim() });
  };
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Class details">
      <Flex direction="column" gap="3">
        <FormErrorCallout message={error && !error.body.details?.length ? error.message : undefined} />
        <ClassDetailsFields value={value} onChange={setValue} error={error} />
        <Flex gap="3" align="center">
          <Button type="submit" loading={pending}>
            Save details
          </Button>
          {saved && (
            <Text size="2" color="gray" role="status">
              Saved.
            </Text>
          )}
        </Flex>
      </Flex>
    </form>
  );
}
