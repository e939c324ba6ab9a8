import { Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useCatchupResults } from '../hooks/useCatchupResults';
import { CatchupResultsTable } from './CatchupResultsTable';

export interface CatchupResultsPanelProps {
  id: string;
  sessionId: string;
  catchupId: string;
  code: string;
}

/** The results of one catch-up, fetched when the teacher opens them. */
export function CatchupResultsPanel({ id, sessionId, catchupId, code }: CatchupResultsPanelProps) {
  const results = useCatchupResults(sessionId, catchupId);
  const headingId = `${id}-heading`;
  return (
    <section id={id} aria-labelledby={headingId}>
      <Flex direction="column" gap="2">
        <Heading as="h3" size="3" id={headingId}>
          Catch-up results {code}
        </Heading>
        {results.isPending && (
          <Flex role="status" gap="2" align="center">
            <Spinner />
            <Text color="gray">Loading results…</Text>
          </Flex>
        )}
        <FormErrorCallout message={results.error?.message} />
        {results.data && <CatchupResultsTable results={results.data} />}
      </Flex>
    </section>
  );
}
