import { Button, Card, DataList, Flex, Heading, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { DistractorTable } from '@/features/debrief/components/DistractorTable';
import { FigureText } from '@/features/debrief/components/FigureText';
import { useDebriefItem } from '@/features/debrief/hooks/useDebrief';
import '@/features/debrief/debrief.css';
import { flagText } from '@/features/debrief/utils/flagLabels';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function DebriefItemPage() {
  const { sessionId = '', itemId = '' } = useParams();
  const item = useDebriefItem(sessionId, itemId);
  const back = (
    <Button asChild variant="ghost" color="gray">
      <Link to={routes.debrief.build(sessionId)}>Back to the debrief</Link>
    </Button>
  );

  if (item.isPending) return <PageFallback label="Loading item…" />;
  if (item.isError) {
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Item analysis" />
        <FormErrorCallout message={item.error.message} />
        {back}
      </Flex>
    );
  }

  const it = item.data;
  return (
    <Flex direction="column" gap="5" className="debrief-print-root">
      <PageHeader title={`Item ${it.position + 1}`} description={it.prompt} />
      <Flex className="debrief-no-print">{back}</Flex>
      <Card size="3">
        <DataList.Root>
          <DataList.Item>
            <DataList.Label>Key</DataList.Label>
            <DataList.Value>{it.keyText}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Explanation</DataList.Label>
            <DataList.Value>{it.explanation || '—'}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Tags</DataList.Label>
            <DataList.Value>{it.tags.length > 0 ? it.tags.join(', ') : '—'}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Answered</DataList.Label>
            <DataList.Value>{it.answeredCount}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>p (difficulty)</DataList.Label>
            <DataList.Value>
              <FigureText figure={it.p} />
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>D (discrimination)</DataList.Label>
            <DataList.Value>
              <FigureText figure={it.D} />
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Point-biserial (corrected)</DataList.Label>
            <DataList.Value>
              <FigureText figure={it.pointBiserial} />
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Reliability if deleted</DataList.Label>
            <DataList.Value>
              <FigureText figure={it.reliabilityIfDeleted} />
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Flags</DataList.Label>
            <DataList.Value>{it.flags.length > 0 ? flagText(it.flags) : 'none'}</DataList.Value>
          </DataList.Item>
        </DataList.Root>
      </Card>
      <section aria-labelledby="distractors-heading">
        <Heading as="h2" size="5" id="distractors-heading" mb="3">
          Distractors
        </Heading>
        {it.distractors.value === null ? (
          <Text color="gray">Not enough data: {it.distractors.reason}</Text>
        ) : (
          <DistractorTable table={it.distractors.value} />
        )}
      </section>
    </Flex>
  );
}
