import { AlertDialog, Button, Flex } from '@radix-ui/themes';
import { sendHostCommand } from '@/realtime';

export interface RemovePlayerButtonProps {
  playerId: string;
  nickname: string;
}

/** Removes a player after a confirmation; their token stops working. */
export function RemovePlayerButton({ playerId, nickname }: RemovePlayerButtonProps) {
  return (
    <AlertDialog.Root>
      <AlertDialog.Trigger>
        <Button variant="ghost" color="gray" size="2" aria-label={`Remove ${nickname}`}>
          Remove
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Content maxWidth="480px">
        <AlertDialog.Title>Remove {nickname}?</AlertDialog.Title>
        <AlertDialog.Description size="2">
          They leave the session and cannot rejoin with this device's link.
        </AlertDialog.Description>
        <Flex gap="3" mt="4" justify="end">
          <AlertDialog.Cancel>
            <Button variant="soft" color="gray">
              Cancel
            </Button>
          </AlertDialog.Cancel>
          <AlertDialog.Action>
            <Button color="red" onClick={() => void sendHostCommand({ type: 'remove_player', playerId })}>
              Remove
            </Button>
          </AlertDialog.Action>
        </Flex>
      </AlertDialog.Content>
    </AlertDialog.Root>
  );
}
