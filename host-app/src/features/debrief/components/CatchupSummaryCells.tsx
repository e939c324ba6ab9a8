import type { CatchupSummaryDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { ofTotal } from '../utils/catchupLabels';
import { formatDateTime } from '../utils/formatDate';
import { formatShare } from '../utils/formatFigure';
import { CatchupStatusBadge } from './CatchupStatusBadge';
import { FigureText } from './FigureText';

/** The headers of a catch-up's progress, in the order CatchupSummaryCells fills them. */
export function CatchupSummaryHeaders() {
  return (
    <>
      <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Students started</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Cards cleared</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Accuracy</Table.ColumnHeaderCell>
    </>
  );
}

/** A catch-up's created date, status and progress: shared by the debrief's and the class page's tables. */
export function CatchupSummaryCells({ catchup: c }: { catchup: CatchupSummaryDto }) {
  return (
    <>
      <Table.Cell>{formatDateTime(c.createdAt)}</Table.Cell>
      <Table.Cell>
        <CatchupStatusBadge closedAt={c.closedAt} />
      </Table.Cell>
      <Table.Cell>{ofTotal(c.startedCount, c.studentCount)}</Table.Cell>
      <Table.Cell>{ofTotal(c.clearedCount, c.cardCount)}</Table.Cell>
      <Table.Cell>
        <FigureText figure={c.accuracy} format={formatShare} />
      </Table.Cell>
    </>
  );
}
