import type { CatchupSummaryDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { ofTotal } from '../utils/catchupLabels';
import { formatDateTime } from '../utils/formatDate';
import { formatShare } from '../utils/formatFigure';
import { CatchupStatusBadge } from './CatchupStatusBadge';
import { FigureText } from './FigureText';

export interface ClassCatchupsTableProps {
  catchups: CatchupSummaryDto[];
}

/** A class's catch-ups, each linking to the debrief it was made from (where it can be closed). */
export function ClassCatchupsTable({ catchups }: ClassCatchupsTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Catch-ups of the class</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Bank</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Students started</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Cards cleared</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Accuracy</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {catchups.map((c) => (
          <Table.Row key={c.id}>
            <Table.RowHeaderCell>
              <Link to={routes.debrief.build(c.sessionId)}>{c.bankTitle}</Link>
            </Table.RowHeaderCell>
            <Table.Cell>{formatDateTime(c.createdAt)}</Table.Cell>
            <Table.Cell>
              <CatchupStatusBadge closedAt={c.closedAt} />
            </Table.Cell>
            <Table.Cell>{ofTotal(c.startedCount, c.studentCount)}</Table.Cell>
            <Table.Cell>{ofTotal(c.clearedCount, c.cardCount)}</Table.Cell>
            <Table.Cell>
              <FigureText figure={c.accuracy} format={formatShare} />
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
