import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { LinkProblemHelp } from '@/features/auth/components/LinkProblemHelp';
import { NewPasswordFields } from '@/features/auth/components/NewPasswordFields';
import { useAcceptInvitation } from '@/features/auth/hooks/useAcceptInvitation';
import { isLinkProblem } from '@/features/auth/utils/isLinkProblem';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { newPasswordProblem } from '@/features/forms/utils/newPasswordProblem';
import { routes } from '@/routes';

export function AcceptInvitePage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [formProblem, setFormProblem] = useState<string>();
  const navigate = useNavigate();
  const accept = useAcceptInvitation();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const problem = newPasswordProblem(password, confirm);
    setFormProblem(problem);
    if (problem) return;
    const name = displayName.trim();
    accept.mutate(
      { token, password, ...(name ? { displayName: name } : {}) },
      { onSuccess: () => void navigate(routes.dashboard.path, { replace: true }) },
    );
  };

  return (
    <Flex direction="column" gap="5">
      <title>Set up your account · Covalent</title>
      <Heading as="h1" size="6">
        Set up your account
      </Heading>
      {!token ? (
        <FormErrorCallout message="This invitation link is missing its code. Open the link from the e-mail again.">
          <LinkProblemHelp kind="invite" />
        </FormErrorCallout>
      ) : (
        <Flex asChild direction="column" gap="5">
          <form onSubmit={onSubmit} noValidate aria-label="Set up your account">
            <Text as="p" color="gray">
              Your school has invited you to Covalent. Choose a password to finish.
            </Text>
            <FormErrorCallout message={formProblem ?? accept.error?.message}>
              {!formProblem && isLinkProblem(accept.error?.code) && <LinkProblemHelp kind="invite" />}
            </FormErrorCallout>
            <FormField
              label="Your name as students see it (optional)"
              hint="Leave empty to keep the name your administrator entered."
              name="displayName"
              autoComplete="name"
              maxLength={120}
              value={displayName}
              onChange={(e) => setDisplayName(e.target.value)}
              errors={accept.error?.fieldMessages('displayName')}
            />
            <NewPasswordFields
              password={password}
              confirm={confirm}
              onPasswordChange={setPassword}
              onConfirmChange={setConfirm}
              serverErrors={accept.error?.fieldMessages('password')}
            />
            <Button type="submit" size="3" loading={accept.isPending} style={{ alignSelf: 'start' }}>
              Create my account
            </Button>
          </form>
        </Flex>
      )}
    </Flex>
  );
}
