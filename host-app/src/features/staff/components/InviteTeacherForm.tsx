import { Button, Callout, Flex, Heading } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { useInviteTeacher } from '../hooks/useInviteTeacher';

/** Invite a teacher of this school by e-mail. */
export function InviteTeacherForm() {
  const [email, setEmail] = useState('');
  const [displayName, setDisplayName] = useState('');
  const invite = useInviteTeacher();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    invite.mutate(
      { email: email.trim(), displayName: displayName.trim() },
      {
        onSuccess: () => {
          setEmail('');
          setDisplayName('');
        },
      },
    );
  };

  return (
    <Flex asChild direction="column" gap="4">
      <form onSubmit={onSubmit} noValidate aria-labelledby="invite-heading">
        <Heading as="h2" size="4" id="invite-heading">
          Invite a teacher
        </Heading>
        <FormErrorCallout message={invite.error?.message} />
        {invite.isSuccess && (
          <Callout.Root role="status" variant="surface">
            <Callout.Text>
              Invitation sent to {invite.data.email}. The account shows as invited until they set a password.
            </Callout.Text>
          </Callout.Root>
        )}
        <Flex gap="4" wrap="wrap" align="end">
          <FormField
            label="Name"
            name="displayName"
            autoComplete="off"
            required
            value={displayName}
            onChange={(e) => setDisplayName(e.target.value)}
            errors={invite.error?.fieldMessages('displayName')}
          />
          <FormField
            label="School e-mail"
            type="email"
            name="email"
            autoComplete="off"
            required
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            errors={invite.error?.fieldMessages('email')}
          />
          <Button type="submit" size="3" loading={invite.isPending}>
            Send invitation
          </Button>
        </Flex>
      </form>
    </Flex>
  );
}
