import { Button, Callout, Flex } from '@radix-ui/themes';
import { apiPaths } from '@/api/apiPaths';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useEmailDebrief } from '../hooks/useEmailDebrief';

export interface DebriefActionsProps {
  sessionId: string;
}

/** Downloads, e-mail and print; hidden when the page is printed. */
export function DebriefActions({ sessionId }: DebriefActionsProps) {
  const email = useEmailDebrief(sessionId);
  return (
    <Flex direction="column" gap="3" className="debrief-no-print">
      <Flex gap="3" wrap="wrap">
        <Button asChild variant="soft">
          <a href={apiPaths.gradebookCsv(sessionId)} download>
            Download gradebook (CSV)
          </a>
        </Button>
        <Button asChild variant="soft">
          <a href={apiPaths.itemAnalysisCsv(sessionId)} download>
            Download item analysis (CSV)
          </a>
        </Button>
        <Button variant="soft" loading={email.isPending} onClick={() => email.mutate()}>
          Send to me and co-teachers
        </Button>
        <Button variant="soft" color="gray" onClick={() => window.print()}>
          Print
        </Button>
      </Flex>
      <div role="status">
        {email.isSuccess && (
          <Callout.Root color="green" variant="surface">
            <Callout.Text>Debrief sent to {email.data.recipients.join(', ')}.</Callout.Text>
          </Callout.Root>
        )}
      </div>
      <FormErrorCallout message={email.error?.message} />
    </Flex>
  );
}
