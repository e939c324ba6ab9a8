import { Flex } from '@radix-ui/themes';
import { FormField } from '@/features/forms/components/FormField';
import type { ApiRequestError } from '@/api/client';
import type { ClassDetailsInput } from '../hooks/useCreateClass';

export interface ClassDetailsFieldsProps {
  value: ClassDetailsInput;
  onChange: (value: ClassDetailsInput) => void;
  error: ApiRequestError | null;
}

/** Name, period and term: shared by "new class" and the class's own details. */
export function ClassDetailsFields({ value, onChange, error }: ClassDetailsFieldsProps) {
  const messages = (field: string) => error?.fieldMessages(field);
  return (
    <Flex gap="3" wrap="wrap" align="start">
      <FormField label="Class name" hint="e.g. Chemistry" value={value.name} onChange={(e) => onChange({ ...value, name: e.target.value })} errors={messages('name')} />
      <FormField label="Period" hint="e.g. 2" value={value.period} onChange={(e) => onChange({ ...value, period: e.target.value })} errors={messages('period')} />
      <FormField label="Term" hint="e.g. Autumn 2026" value={value.term} onChange={(e) => onChange({ ...value, term: e.target.value })} errors={messages('term')} />
    </Flex>
  );
}
