import type { CoTeacherDto } from '@covalent/shared-types';
import { Button, Flex, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';

export interface CoTeachersCardProps {
  coTeachers: CoTeacherDto[];
  canEdit: boolean;
  pending: boolean;
  error: ApiRequestError | null;
  onAdd: (email: string, done: () => void) => void;
  onRemove: (coTeacher: CoTeacherDto) => void;
}

/** Colleagues who may run sessions and read reports of this class. */
export function CoTeachersCard({ coTeachers, canEdit, pending, error, onAdd, onRemove }: CoTeachersCardProps) {
  const [email, setEmail] = useState('');
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onAdd(email.trim(), () => setEmail(''));
  };
  const emailErrors = error?.fieldMessages('email') ?? [];
  return (
    <Flex direction="column" gap="3">
      {coTeachers.length === 0 ? (
        <Text size="2" color="gray">
          No co-teachers.
        </Text>
      ) : (
        <ul className="plain-list" aria-label="Co-teachers">
          {coTeachers.map((c) => (
            <li key={c.userId}>
              <Flex gap="3" align="center" py="1">
                <Text>
                  {c.displayName} <Text color="gray">({c.email})</Text>
                </Text>
                {canEdit && (
                  <Button size="1" variant="soft" color="gray" aria-label={`Remove co-teacher ${c.displayName}`} onClick={() => onRemove(c)}>
                    Remove
                  </Button>
                )}
              </Flex>
            </li>
          ))}
        </ul>
      )}
      {canEdit && (
        <form onSubmit={onSubmit} noValidate aria-label="Add a co-teacher">
          <Flex direction="column" gap="2">
            <FormErrorCallout message={error && emailErrors.length === 0 ? error.message : undefined} />
            <Flex gap="3" align="end" wrap="wrap">
              <FormField label="Co-teacher's school e-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} errors={emailErrors} />
              <Button type="submit" size="3" variant="soft" loading={pending}>
                Add co-teacher
              </Button>
            </Flex>
          </Flex>
        </form>
      )}
    </Flex>
  );
}
