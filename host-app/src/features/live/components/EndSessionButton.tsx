import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import { sendHostCommand } from '@/realtime';

/** Ends the session for everyone, after a confirmation: it cannot be undone. */
export function EndSessionButton() {
  return (
    <AlertDialog.Root>
      <AlertDialog.Trigger>
        <Button size="4" variant="soft" color="gray">
          End
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="520px">
        <AlertDialog.Title>End the session now?</AlertDialog.Title>
        <AlertDialog.Description size="3">
          Rounds not yet played are skipped. Every answer so far is kept for the debrief.
        </AlertDialog.Description>
        <Flex gap="3" mt="4" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              Keep playing
            </Button>
          </AlertDialog.Cancel>
          <AlertDialog.Action>
            <Button onClick={() => void sendHostCommand({ type: 'end' })}>End session</Button>
          </AlertDialog.Action>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
