import { SHARE_ACCESS, type BankDetailDto, type ShareAccess } from '@covalent/shared-types';
import { Button, Dialog, Flex, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { FormField } from '@/features/forms/components/FormField';
import { NativeSelect } from '@/features/forms/components/NativeSelect';
import { useShareBank } from '../hooks/useShareBank';
import { useUnshareBank } from '../hooks/useUnshareBank';

export interface ShareBankDialogProps {
  bank: BankDetailDto;
}

const ACCESS_LABELS: Record<ShareAccess, string> = { view: 'Can view', edit: 'Can edit' };
const ACCESS_OPTIONS = SHARE_ACCESS.map((a) => ({ value: a, label: ACCESS_LABELS[a] }));

/** Share with a colleague of the school by e-mail, or change and remove shares. Owner only. */
export function ShareBankDialog({ bank }: ShareBankDialogProps) {
  const [email, setEmail] = useState('');
  const [access, setAccess] = useState<ShareAccess>('view');
  const share = useShareBank(bank.id);
  const unshare = useUnshareBank(bank.id);

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    share.mutate({ email: email.trim(), access }, { onSuccess: () => setEmail('') });
  };
  const emailErrors = share.error?.fieldMessages('email') ?? [];

  return (
    <Dialog.Root onOpenChange={() => share.reset()}>
      <Dialog.Trigger>
        <Button variant="soft">Share</Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="560px">
        <Dialog.Title>Share “{bank.title}”</Dialog.Title>
        <Dialog.Description size="2" color="gray">
          Colleagues in your school. “Can edit” lets them change items and details; only you can delete, archive or share.
        </Dialog.Description>
        <form onSubmit={onSubmit} noValidate>
          <Flex direction="column" gap="3" mt="4">
            <FormErrorCallout message={share.error && emailErrors.length === 0 ? share.error.message : undefined} />
            <Flex gap="3" align="end" wrap="wrap">
              <FormField label="Colleague's school e-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} errors={emailErrors} />
              <FieldFrame label="Access" errors={share.error?.fieldMessages('access')}>
                {(control) => <NativeSelect {...control} options={ACCESS_OPTIONS} value={access} onChange={(e) => setAccess(e.target.value as ShareAccess)} />}
              </FieldFrame>
              <Button type="submit" size="3" loading={share.isPending}>
                Share
              </Button>
            </Flex>
          </Flex>
        </form>
        <Flex direction="column" gap="2" mt="5">
          <Text weight="bold" size="2">
            Shared with
          </Text>
          <FormErrorCallout message={unshare.error?.message} />
          {bank.shares.length === 0 ? (
            <Text size="2" color="gray">
              Nobody yet.
            </Text>
          ) : (
            <ul className="plain-list" aria-label="Shared with">
              {bank.shares.map((s) => (
                <li key={s.userId}>
                  <Flex gap="3" align="center" justify="between" py="1">
                    <Text size="2">
                      {s.displayName} ({s.email}) · {ACCESS_LABELS[s.access]}
                    </Text>
                    <Button size="1" variant="soft" color="gray" aria-label={`Stop sharing with ${s.displayName}`} onClick={() => unshare.mutate(s.userId)}>
                      Remove
                    </Button>
                  </Flex>
                </li>
              ))}
            </ul>
          )}
        </Flex>
        <Flex justify="end" mt="4">
          <Dialog.Close>
            <Button variant="soft" color="gray">
              Done
            </Button>
          </Dialog.Close>
        </Flex>
      </Dialog.Content>
    </Dialog.Root>
  );
}
