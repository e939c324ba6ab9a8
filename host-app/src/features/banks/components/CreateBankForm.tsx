import { Button, Flex } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { routes } from '@/routes';
import { useCreateBank } from '../hooks/useCreateBank';

/** A title is enough to start; the bank opens for its first item. */
export function CreateBankForm() {
  const [title, setTitle] = useState('');
  const create = useCreateBank();
  const navigate = useNavigate();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    create.mutate({ title: title.trim() }, { onSuccess: (bank) => navigate(routes.bank.build(bank.id)) });
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New bank">
      <Flex direction="column" gap="3">
        <FormErrorCallout message={create.error && !create.error.fieldMessages('title').length ? create.error.message : undefined} />
        <Flex gap="3" align="end" wrap="wrap">
          <FormField
            label="New bank title"
            name="title"
            autoComplete="off"
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            errors={create.error?.fieldMessages('title')}
          />
          <Button type="submit" size="3" loading={create.isPending}>
            Create bank
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
