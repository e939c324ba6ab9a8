import { Card, Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useCatchups } from '../hooks/useCatchups';
import { useCloseCatchup } from '../hooks/useCloseCatchup';
import { CatchupResultsPanel } from './CatchupResultsPanel';
import { CatchupsTable } from './CatchupsTable';

export interface CatchupsCardProps {
  sessionId: string;
}

const resultsIdFor = (catchupId: string) => `catchup-results-${catchupId}`;

/** The session's catch-ups and their results; kept off the printed debrief. */
export function CatchupsCard({ sessionId }: CatchupsCardProps) {
  const catchups = useCatchups(sessionId);
  const close = useCloseCatchup(sessionId);
  const [expanded, setExpanded] = useState<ReadonlySet<string>>(new Set());
  const toggle = (catchupId: string) =>
    setExpanded((prev) => {
      const next = new Set(prev);
      if (!next.delete(catchupId)) next.add(catchupId);
      return next;
    });

  const list = catchups.data ?? [];
  const shown = list.filter((c) => expanded.has(c.id));
  return (
    <Card className="debrief-no-print" size="3" asChild>
      <section aria-labelledby="catchups-heading">
        <Flex direction="column" gap="3">
          <Heading as="h2" size="4" id="catchups-heading">
            Catch-ups
          </Heading>
          {catchups.isPending && (
            <Flex role="status" gap="2" align="center">
              <Spinner />
              <Text color="gray">Loading catch-ups…</Text>
            </Flex>
          )}
          <FormErrorCallout message={catchups.error?.message} />
          <FormErrorCallout message={close.error?.message} />
          {catchups.isSuccess && list.length === 0 && <Text color="gray">No catch-ups from this session yet.</Text>}
          {list.length > 0 && (
            <CatchupsTable
              catchups={list}
              expanded={expanded}
              resultsIdFor={resultsIdFor}
              onToggleResults={toggle}
              onClose={(id) => close.mutate(id)}
              closingId={close.isPending ? (close.variables ?? null) : null}
            />
          )}
          {shown.map((c) => (
            <CatchupResultsPanel key={c.id} id={resultsIdFor(c.id)} sessionId={sessionId} catchupId={c.id} code={c.code} />
          ))}
        </Flex>
      </section>
    </Card>
  );
}
