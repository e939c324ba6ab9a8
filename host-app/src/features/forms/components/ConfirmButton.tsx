import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface ConfirmButtonProps {
  /** The trigger's text. */
  label: string;
  /** The trigger's accessible name when the visible label is not enough ("Delete Lab entry"). */
  ariaLabel?: string;
  title: string;
  description: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  disabled?: boolean;
  /** A red, larger trigger for deleting a person's data, where a quiet one would undersell it. */
  danger?: boolean;
}

/** A quiet button that asks before doing something that cannot be undone. */
export function ConfirmButton({ label, ariaLabel, title, description, confirmLabel, onConfirm, disabled, danger = false }: ConfirmButtonProps) {
  return (
    <AlertDialog.Root>
      <AlertDialog.Trigger>
        <Button size={danger ? '2' : '1'} variant="soft" color={danger ? 'red' : 'gray'} aria-label={ariaLabel} disabled={disabled}>
          {label}
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="460px">
        <AlertDialog.Title>{title}</AlertDialog.Title>
        <AlertDialog.Description size="3">{description}</AlertDialog.Description>
        <Flex gap="3" mt="5" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              Cancel
            </Button>
          </AlertDialog.Cancel>
          <AlertDialog.Action>
            <Button color="red" onClick={onConfirm}>
              {confirmLabel}
            </Button>
          </AlertDialog.Action>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
