import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { ApiRequestError } from '@/api/client';
import { CatchupsCard } from '@/features/debrief/components/CatchupsCard';
import { CreateCatchup } from '@/features/debrief/components/CreateCatchup';
import { DebriefActions } from '@/features/debrief/components/DebriefActions';
import { DebriefSummary } from '@/features/debrief/components/DebriefSummary';
import { ItemAnalysisTable } from '@/features/debrief/components/ItemAnalysisTable';
import { StudentsTable } from '@/features/debrief/components/StudentsTable';
import { TeamsTable } from '@/features/debrief/components/TeamsTable';
import { useDebrief } from '@/features/debrief/hooks/useDebrief';
import '@/features/debrief/debrief.css';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function DebriefPage() {
  const { sessionId = '' } = useParams();
  const debrief = useDebrief(sessionId);

  if (debrief.isPending) return <PageFallback label="Loading debrief…" />;
  if (debrief.isError) {
    const live = debrief.error instanceof ApiRequestError && debrief.error.code === 'session_not_ended';
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Debrief" />
        <FormErrorCallout message={live ? 'This session is still live. Its debrief opens once the session ends.' : debrief.error.message} />
        <Flex gap="3">
          {live && (
            <Button asChild>
              <Link to={routes.hostSession.build(sessionId)}>Open host screen</Link>
            </Button>
          )}
          <Button asChild variant="soft">
            <Link to={routes.debriefs.build()}>All debriefs</Link>
          </Button>
        </Flex>
      </Flex>
    );
  }

  const d = debrief.data;
  return (
    <Flex direction="column" gap="5" className="debrief-print-root">
      <PageHeader title={`Debrief: ${d.bankTitle}`} description="Figures as in the item analysis rules: p difficulty, D discrimination, corrected point-biserial." />
      <Flex className="debrief-no-print">
        <Button asChild variant="ghost" color="gray">
          <Link to={routes.debriefs.build()}>All debriefs</Link>
        </Button>
      </Flex>
      <DebriefActions sessionId={d.sessionId} />
      {d.classId && <CreateCatchup sessionId={d.sessionId} />}
      {d.classId && <CatchupsCard sessionId={d.sessionId} />}
      <section aria-labelledby="summary-heading">
        <Heading as="h2" size="5" id="summary-heading" mb="3">
          Summary
        </Heading>
        <DebriefSummary summary={d} />
      </section>
      <section aria-labelledby="items-heading">
        <Heading as="h2" size="5" id="items-heading" mb="3">
          Items
        </Heading>
        <Text as="p" size="2" color="gray" mb="3">
          Flags: hard (p under 0.30), easy (p over 0.90), weak (D under 0.20), possible mis-key (D under 0). Open an item for its distractors.
        </Text>
        <ItemAnalysisTable sessionId={d.sessionId} items={d.items} />
      </section>
      <section aria-labelledby="students-heading">
        <Heading as="h2" size="5" id="students-heading" mb="3">
          Students
        </Heading>
        {d.unit === 'team' && (
          <Text as="p" size="2" color="gray" mb="3">
            Each student carries their team's figures in this format.
          </Text>
        )}
        <StudentsTable sessionId={d.sessionId} students={d.students} />
      </section>
      {d.teams.length > 0 && (
        <section aria-labelledby="teams-heading">
          <Heading as="h2" size="5" id="teams-heading" mb="3">
            Teams
          </Heading>
          <TeamsTable teams={d.teams} />
        </section>
      )}
    </Flex>
  );
}
