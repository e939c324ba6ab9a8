import { Flex, Link as ThemeLink, Text } from '@radix-ui/themes';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { LinkPasswordForm } from '@/features/auth/components/LinkPasswordForm';
import { useResetPassword } from '@/features/auth/hooks/useResetPassword';
import { routes } from '@/routes';

export function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const navigate = useNavigate();
  const reset = useResetPassword();

  return (
    <Flex direction="column" gap="5">
      <LinkPasswordForm
        kind="reset"
        title="Choose a new password"
        token={token}
        missingTokenMessage="This link is missing its code. Open the link from the e-mail again."
        submitLabel="Save the new password"
        pending={reset.isPending}
        error={reset.error}
        onSubmit={(password) => reset.mutate({ token, password }, { onSuccess: () => void navigate(routes.dashboard.path, { replace: true }) })}
      />
      <Text size="2">
        <ThemeLink asChild>
          <Link to={routes.signIn.build()}>Back to sign in</Link>
        </ThemeLink>
      </Text>
    </Flex>
  );
}
