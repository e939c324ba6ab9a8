import { Button, Callout, Card, Code, Flex, Heading, Text } from '@radix-ui/themes';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useCreateCatchup } from '../hooks/useCreateCatchup';

export interface CreateCatchupProps {
  sessionId: string;
}

/** Creates a catch-up from this session's missed items and shows the code students open it with. */
export function CreateCatchup({ sessionId }: CreateCatchupProps) {
  const create = useCreateCatchup(sessionId);
  const link = create.data ? `${window.location.origin}/play/catchup/${create.data.code}` : null;
  return (
    <Card className="debrief-no-print" size="3">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="4">
          Catch-up
        </Heading>
        <Text color="gray">
          Each student gets the items they missed, self-paced on their own device, with the explanation after each answer.
          Items they get right come back less often.
        </Text>
        {!create.data && (
          <Flex>
            <Button onClick={() => create.mutate()} loading={create.isPending}>
              Create catch-up
            </Button>
          </Flex>
        )}
        <div role="status">
          {create.data && link && (
            <Callout.Root color="green" variant="surface">
              <Callout.Text>
                Catch-up ready: {create.data.cardCount} items across the class. Students open <Code>{link}</Code> — code{' '}
                <strong data-testid="catchup-code">{create.data.code}</strong>.
              </Callout.Text>
            </Callout.Root>
          )}
        </div>
        <FormErrorCallout message={create.error?.message} />
      </Flex>
    </Card>
  );
}
