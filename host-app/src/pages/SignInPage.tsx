import { Button, Callout, Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { SchoolSignOn } from '@/features/auth/components/SchoolSignOn';
import { useSignIn } from '@/features/auth/hooks/useSignIn';
import { safeNextPath } from '@/features/auth/utils/safeNextPath';
import { signOnErrorMessage } from '@/features/auth/utils/signOnErrorMessage';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { routes } from '@/routes';
import { useSignOutStore } from '@/stores/useSignOutStore';

export function SignInPage() {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const signedOut = useSignOutStore((s) => s.signedOut);
  const next = safeNextPath(searchParams.get('next'));
  // A school sign-on that failed comes back here with ?error=<code>.
  const signOnError = signOnErrorMessage(searchParams.get('error'));

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    signIn.mutate(
      { email: email.trim(), password },
      {
        onSuccess: () => {
          void navigate(next ?? routes.dashboard.path, { replace: true });
        },
      },
    );
  };

  return (
    <Flex asChild direction="column" gap="5">
      <form onSubmit={onSubmit} noValidate aria-labelledby="sign-in-heading">
        <title>Sign in · Covalent</title>
        <Heading as="h1" size="6" id="sign-in-heading">
          Sign in
        </Heading>
        {signedOut && !signIn.error && !signOnError && (
          <Callout.Root role="status" variant="surface">
            <Callout.Text>You have signed out.</Callout.Text>
          </Callout.Root>
        )}
        <FormErrorCallout message={signIn.error?.message ?? signOnError} />
        <FormField
          label="E-mail"
          type="email"
          name="email"
          autoComplete="email"
          required
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          errors={signIn.error?.fieldMessages('email')}
        />
        <FormField
          label="Password"
          type="password"
          name="password"
          autoComplete="current-password"
          required
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          errors={signIn.error?.fieldMessages('password')}
        />
        <Flex direction="column" gap="3" align="start">
          <Button type="submit" size="3" loading={signIn.isPending}>
            Sign in
          </Button>
          <Text size="2">
            <ThemeLink asChild>
              <Link to={routes.forgotPassword.build()}>Forgot your password?</Link>
            </ThemeLink>
          </Text>
        </Flex>
        <SchoolSignOn next={next} />
      </form>
    </Flex>
  );
}

