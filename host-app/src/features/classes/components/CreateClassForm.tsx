import { Button, Flex, Heading } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { routes } from '@/routes';
import { useCreateClass, type ClassDetailsInput } from '../hooks/useCreateClass';
import { ClassDetailsFields } from './ClassDetailsFields';

const EMPTY: ClassDetailsInput = { name: '', period: '', term: '' };

/** A new class opens straight away so its roster can be built. */
export function CreateClassForm() {
  const [value, setValue] = useState(EMPTY);
  const create = useCreateClass();
  const navigate = useNavigate();
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    create.mutate(
      { name: value.name.trim(), period: value.period.trim(), term: value.term.trim() },
      { onSuccess: (cls) => navigate(routes.classDetail.build(cls.id)) },
    );
  };
  const placed = create.error?.body.details?.length;
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="new-class-heading">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="4" id="new-class-heading">
          New class
        </Heading>
        <FormErrorCallout message={create.error && !placed ? create.error.message : undefined} />
        <ClassDetailsFields value={value} onChange={setValue} error={create.error} />
        <div>
          <Button type="submit" size="3" loading={create.isPending}>
            Create class
          </Button>
        </div>
      </Flex>
    </form>
  );
}
