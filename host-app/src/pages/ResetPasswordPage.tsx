import { Button, Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { LinkProblemHelp } from '@/features/auth/components/LinkProblemHelp';
import { NewPasswordFields } from '@/features/auth/components/NewPasswordFields';
import { useResetPassword } from '@/features/auth/hooks/useResetPassword';
import { isLinkProblem } from '@/features/auth/utils/isLinkProblem';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { newPasswordProblem } from '@/features/forms/utils/newPasswordProblem';
import { routes } from '@/routes';

export function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [formProblem, setFormProblem] = useState<string>();
  const navigate = useNavigate();
  const reset = useResetPassword();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const problem = newPasswordProblem(password, confirm);
    setFormProblem(problem);
    if (problem) return;
    reset.mutate(
      { token, password },
      { onSuccess: () => void navigate(routes.dashboard.path, { replace: true }) },
    );
  };

  return (
    <Flex direction="column" gap="5">
      <title>Choose a new password · Covalent</title>
      <Heading as="h1" size="6">
        Choose a new password
      </Heading>
      {!token ? (
        <FormErrorCallout message="This link is missing its code. Open the link from the e-mail again.">
          <LinkProblemHelp kind="reset" />
        </FormErrorCallout>
      ) : (
        <Flex asChild direction="column" gap="5">
          <form onSubmit={onSubmit} noValidate aria-label="Choose a new password">
            <FormErrorCallout message={formProblem ?? reset.error?.message}>
              {!formProblem && isLinkProblem(reset.error?.code) && <LinkProblemHelp kind="reset" />}
            </FormErrorCallout>
            <NewPasswordFields
              password={password}
              confirm={confirm}
              onPasswordChange={setPassword}
              onConfirmChange={setConfirm}
              serverErrors={reset.error?.fieldMessages('password')}
            />
            <Button type="submit" size="3" loading={reset.isPending} style={{ alignSelf: 'start' }}>
              Save the new password
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
