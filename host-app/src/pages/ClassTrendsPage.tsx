import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { ClassCatchupsTable } from '@/features/debrief/components/ClassCatchupsTable';
import { ClassStudentsTable } from '@/features/debrief/components/ClassStudentsTable';
import { TagTrendChart } from '@/features/debrief/components/TagTrendChart';
import { TagTrendTable } from '@/features/debrief/components/TagTrendTable';
import { useClassTrends } from '@/features/debrief/hooks/useClassTrends';
import { trendRows } from '@/features/debrief/utils/trendRows';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function ClassTrendsPage() {
  const { classId = '' } = useParams();
  const trends = useClassTrends(classId);
  const back = (
    <Button asChild variant="ghost" color="gray">
      <Link to={routes.classDetail.build(classId)}>Back to the class</Link>
    </Button>
  );

  if (trends.isPending) return <PageFallback label="Loading trends…" />;
  if (trends.isError) {
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Trends" />
        <FormErrorCallout message={trends.error.message} />
        {back}
      </Flex>
    );
  }

  const t = trends.data;
  const rows = trendRows(t);
  const tags = t.tags.map((x) => x.tag);
  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title={`Trends: ${t.className}`}
        description="Class accuracy by tag across ended sessions, oldest first; each student's figures and the class's catch-ups."
      />
      <Flex>{back}</Flex>
      {rows.length === 0 || tags.length === 0 ? (
        <EmptyState title="No trends yet">Once this class has ended sessions with tagged items, accuracy by tag appears here.</EmptyState>
      ) : (
        <section aria-labelledby="trend-heading">
          <Heading as="h2" size="5" id="trend-heading" mb="3">
            Accuracy by tag
          </Heading>
          <TagTrendChart
            tags={tags}
            rows={rows}
            label={`Line chart of accuracy by tag for ${t.className} across ${rows.length} sessions; the same numbers are in the table below.`}
          />
          <TagTrendTable tags={tags} rows={rows} />
        </section>
      )}
      <section aria-labelledby="students-heading">
        <Heading as="h2" size="5" id="students-heading" mb="3">
          Students
        </Heading>
        {t.students.length === 0 ? (
          <Text color="gray">No students on the class list yet.</Text>
        ) : (
          <ClassStudentsTable classId={t.classId} students={t.students} />
        )}
      </section>
      <section aria-labelledby="catchups-heading">
        <Heading as="h2" size="5" id="catchups-heading" mb="3">
          Catch-ups
        </Heading>
        {t.catchups.length === 0 ? (
          <Text color="gray">No catch-ups yet. Create one from a session's debrief.</Text>
        ) : (
          <ClassCatchupsTable catchups={t.catchups} />
        )}
      </section>
    </Flex>
  );
}
