import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { useParams } from 'react-router-dom';
import { ApiRequestError } from '@/api/client';
import '@/features/debrief/debrief.css';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { DeleteStudentData } from '@/features/history/components/DeleteStudentData';
import { HistoryBackLinks } from '@/features/history/components/HistoryBackLinks';
import { HistorySessionsTable } from '@/features/history/components/HistorySessionsTable';
import { HistorySummary } from '@/features/history/components/HistorySummary';
import { StudentCatchupCard } from '@/features/history/components/StudentCatchupCard';
import { useStudentHistory } from '@/features/history/hooks/useStudentHistory';
import { tableGroupLabel } from '@/features/history/utils/tableGroupLabel';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';

const NOT_FOUND = 'No history to show: this student is not on the class list, or the class is not one you can see.';

export function StudentHistoryPage() {
  const { classId = '', entryId = '' } = useParams();
  const history = useStudentHistory(classId, entryId);

  if (history.isPending) return <PageFallback label="Loading history…" />;
  if (history.isError) {
    const notFound = history.error instanceof ApiRequestError && history.error.status === 404;
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Student history" />
        <FormErrorCallout message={notFound ? NOT_FOUND : history.error.message} />
        <HistoryBackLinks classId={classId} />
      </Flex>
    );
  }

  const h = history.data;
  return (
    <Flex direction="column" gap="5" className="debrief-print-root">
      <PageHeader title={h.displayName} description={`${h.className} · ${tableGroupLabel(h.tableGroup)}`} />
      <Text as="p" size="2" color="gray">
        Practice and review results, oldest first: a picture of what to go over again, not a grade.
      </Text>
      <Flex gap="3" wrap="wrap" align="center" className="debrief-no-print">
        <HistoryBackLinks classId={h.classId} />
        <Button variant="soft" color="gray" onClick={() => window.print()}>
          Print
        </Button>
      </Flex>
      <HistorySummary history={h} />
      <section aria-labelledby="history-sessions-heading">
        <Heading as="h2" size="5" id="history-sessions-heading" mb="3">
          Sessions
        </Heading>
        {h.sessions.length === 0 ? (
          <Text color="gray">No ended sessions for this student in this class yet.</Text>
        ) : (
          <HistorySessionsTable sessions={h.sessions} />
        )}
      </section>
      <section aria-labelledby="history-catchups-heading">
        <Heading as="h2" size="5" id="history-catchups-heading" mb="3">
          Catch-ups
        </Heading>
        {h.catchups.length === 0 ? (
          <Text color="gray">No catch-up cards for this student yet.</Text>
        ) : (
          <Flex direction="column" gap="3">
            {h.catchups.map((c) => (
              <StudentCatchupCard key={c.catchupId} catchup={c} />
            ))}
          </Flex>
        )}
      </section>
      <DeleteStudentData history={h} />
    </Flex>
  );
}
