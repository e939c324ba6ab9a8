import { Button, Dialog, Flex, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { sendHostCommand } from '@/realtime';

export interface RenamePlayerDialogProps {
  playerId: string;
  nickname: string;
}

/** Lets the teacher replace an unsuitable nickname. */
export function RenamePlayerDialog({ playerId, nickname }: RenamePlayerDialogProps) {
  const [open, setOpen] = useState(false);
  const [value, setValue] = useState(nickname);
  const trimmed = value.trim();

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!trimmed) return;
    if (await sendHostCommand({ type: 'rename_player', playerId, nickname: trimmed })) setOpen(false);
  };

  return (
    <Dialog.Root
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (next) setValue(nickname);
      }}
    >
      <Dialog.Trigger>
        <Button variant="ghost" color="gray" size="2" aria-label={`Rename ${nickname}`}>
          Rename
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="480px">
        <Dialog.Title>Rename {nickname}</Dialog.Title>
        <Dialog.Description size="2" color="gray">
          The new name shows on every screen at once.
        </Dialog.Description>
        <form onSubmit={submit}>
          <Flex direction="column" gap="4" mt="4">
            <TextField.Root size="3" aria-label="New nickname" value={value} maxLength={24} onChange={(e) => setValue(e.target.value)} />
            <Flex gap="3" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" disabled={!trimmed}>
                Save name
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
