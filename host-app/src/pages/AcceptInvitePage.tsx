import { Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { LinkPasswordForm } from '@/features/auth/components/LinkPasswordForm';
import { useAcceptInvitation } from '@/features/auth/hooks/useAcceptInvitation';
import { FormField } from '@/features/forms/components/FormField';
import { routes } from '@/routes';

export function AcceptInvitePage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token') ?? '';
  const [displayName, setDisplayName] = useState('');
  const navigate = useNavigate();
  const accept = useAcceptInvitation();

  const onSubmit = (password: string) => {
    const name = displayName.trim();
    accept.mutate(
      { token, password, ...(name ? { displayName: name } : {}) },
      { onSuccess: () => void navigate(routes.dashboard.path, { replace: true }) },
    );
  };

  return (
    <Flex direction="column" gap="5">
      <LinkPasswordForm
        kind="invite"
        title="Set up your account"
        token={token}
        missingTokenMessage="This invitation link is missing its code. Open the link from the e-mail again."
        submitLabel="Create my account"
        pending={accept.isPending}
        error={accept.error}
        onSubmit={onSubmit}
      >
        <Text as="p" color="gray">
          Your school has invited you to Covalent. Choose a password to finish.
        </Text>
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
      </LinkPasswordForm>
    </Flex>
  );
}
