import type { StudentCatchupDto } from '@covalent/shared-types';
import { Card, DataList, Flex, Heading } from '@radix-ui/themes';
import { CatchupStatusBadge } from '@/features/debrief/components/CatchupStatusBadge';
import { ofTotal } from '@/features/debrief/utils/catchupLabels';
import { formatDate, formatDateTime } from '@/features/debrief/utils/formatDate';
import { CatchupItemsTable } from './CatchupItemsTable';

export interface StudentCatchupCardProps {
  catchup: StudentCatchupDto;
}

/** One catch-up as this student has played it so far. */
export function StudentCatchupCard({ catchup: c }: StudentCatchupCardProps) {
  const title = `${c.bankTitle}, ${formatDate(c.createdAt)}`;
  const headingId = `history-catchup-${c.catchupId}`;
  return (
    <Card size="2" asChild>
      <article aria-labelledby={headingId}>
        <Flex direction="column" gap="3">
          <Heading as="h3" size="3" id={headingId}>
            {title}
          </Heading>
          <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
            <DataList.Item>
              <DataList.Label>Created</DataList.Label>
              <DataList.Value>{formatDateTime(c.createdAt)}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Status</DataList.Label>
              <DataList.Value>
                <CatchupStatusBadge closedAt={c.closedAt} />
                {c.closedAt && <>&nbsp;{formatDateTime(c.closedAt)}</>}
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Cards cleared</DataList.Label>
              <DataList.Value>{ofTotal(c.clearedCount, c.cardCount)}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Attempts</DataList.Label>
              <DataList.Value>{c.attempts}</DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Correct attempts</DataList.Label>
              <DataList.Value>{c.correctAttempts}</DataList.Value>
            </DataList.Item>
          </DataList.Root>
          <CatchupItemsTable caption={`Catch-up items: ${title}`} items={c.items} />
        </Flex>
      </article>
    </Card>
  );
}
