import { Button, Flex, Heading } from '@radix-ui/themes';
import { useState, type FormEvent, type ReactNode } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { newPasswordProblem } from '@/features/forms/utils/newPasswordProblem';
import { isLinkProblem } from '../utils/isLinkProblem';
import { LinkProblemHelp } from './LinkProblemHelp';
import { NewPasswordFields } from './NewPasswordFields';

export interface LinkPasswordFormProps {
  /** Which e-mailed link this is: what help to offer when the link is bad. */
  kind: 'invite' | 'reset';
  /** The page's heading, title and the form's accessible name. */
  title: string;
  /** The code from the link; empty when the link lost it. */
  token: string;
  missingTokenMessage: string;
  submitLabel: string;
  pending: boolean;
  error: ApiRequestError | null;
  /** Called with the password once both fields agree and meet the rules. */
  onSubmit: (password: string) => void;
  /** Shown above the password fields (an intro, extra fields). */
  children?: ReactNode;
}

/** The page behind an e-mailed single-use link: choose a password (invitation or reset). */
export function LinkPasswordForm({ kind, title, token, missingTokenMessage, submitLabel, pending, error, onSubmit, children }: LinkPasswordFormProps) {
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [formProblem, setFormProblem] = useState<string>();

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const problem = newPasswordProblem(password, confirm);
    setFormProblem(problem);
    if (!problem) onSubmit(password);
  };

  return (
    <>
      <title>{`${title} · Covalent`}</title>
      <Heading as="h1" size="6">
        {title}
      </Heading>
      {!token ? (
        <FormErrorCallout message={missingTokenMessage}>
          <LinkProblemHelp kind={kind} />
        </FormErrorCallout>
      ) : (
        <Flex asChild direction="column" gap="5">
          <form onSubmit={submit} noValidate aria-label={title}>
            <FormErrorCallout message={formProblem ?? error?.message}>
              {!formProblem && isLinkProblem(error?.code) && <LinkProblemHelp kind={kind} />}
            </FormErrorCallout>
            {children}
            <NewPasswordFields
              password={password}
              confirm={confirm}
              onPasswordChange={setPassword}
              onConfirmChange={setConfirm}
              serverErrors={error?.fieldMessages('password')}
            />
            <Button type="submit" size="3" loading={pending} style={{ alignSelf: 'start' }}>
              {submitLabel}
            </Button>
          </form>
        </Flex>
      )}
    </>
  );
}
