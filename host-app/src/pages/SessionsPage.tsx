import { Button, Flex } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { SessionsTable } from '@/features/sessions/components/SessionsTable';
import { useSessions } from '@/features/sessions/hooks/useSessions';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function SessionsPage() {
  const sessions = useSessions();
  return (
    <>
      <PageHeader title="Sessions" description="Live reviews you have set up. Open the host screen on the room's projector." />
      <Flex direction="column" gap="4">
        <Flex>
          <Button asChild size="3">
            <Link to={routes.sessionNew.build()}>New session</Link>
          </Button>
        </Flex>
        <FormErrorCallout message={sessions.error?.message} />
        {sessions.isPending ? (
          <PageFallback label="Loading sessions…" />
        ) : sessions.data && sessions.data.length > 0 ? (
          <SessionsTable sessions={sessions.data} />
        ) : (
          !sessions.isError && (
            <EmptyState title="No sessions yet">Set up a session from one of your banks; it will be listed here.</EmptyState>
          )
        )}
      </Flex>
    </>
  );
}
