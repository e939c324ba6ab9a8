import { Button, Callout, Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useRequestPasswordReset } from '@/features/auth/hooks/useRequestPasswordReset';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { routes } from '@/routes';

// The same words whether or not the address has an account, so the page reveals nothing.
const NEUTRAL_CONFIRMATION = 'If that address has an account, a reset link is on its way.';

export function ForgotPasswordPage() {
  const [email, setEmail] = useState('');
  const request = useRequestPasswordReset();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    request.mutate({ email: email.trim() });
  };

  return (
    <Flex direction="column" gap="5">
      <title>Reset your password · Covalent</title>
      <Heading as="h1" size="6">
        Reset your password
      </Heading>
      {request.isSuccess ? (
        <Callout.Root role="status" variant="surface">
          <Callout.Text>
            {request.data?.message ?? NEUTRAL_CONFIRMATION} The link works once and for a limited time.
          </Callout.Text>
        </Callout.Root>
      ) : (
        <Flex asChild direction="column" gap="5">
          <form onSubmit={onSubmit} noValidate aria-label="Request a password reset link">
            <Text as="p" color="gray">
              Enter the e-mail address you sign in with. We will send a link to choose a new password.
            </Text>
            <FormErrorCallout message={request.error?.message} />
            <FormField
              label="E-mail"
              type="email"
              name="email"
              autoComplete="email"
              required
              value={email}
              onChange={(e) => setEmail(e.target.value)}
              errors={request.error?.fieldMessages('email')}
            />
            <Button type="submit" size="3" loading={request.isPending} style={{ alignSelf: 'start' }}>
              Send the link
            </Button>
          </form>
        </Flex>
      )}
      <Text size="2">
        <ThemeLink asChild>
          <Link to={routes.signIn.build()}>Back to sign in</Link>
        </ThemeLink>
      </Text>
    </Flex>
  );
}
