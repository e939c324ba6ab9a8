import type { DebriefSummaryDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { formatShare } from '../utils/formatFigure';
import { formatDateTime } from '../utils/formatDate';
import { FigureText } from './FigureText';

export interface DebriefsTableProps {
  debriefs: DebriefSummaryDto[];
}

/** Ended sessions, each opening its debrief. */
export function DebriefsTable({ debriefs }: DebriefsTableProps) {
  return (
    <Table.Root variant="surface">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Bank</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Class</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Played at</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Players</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Accuracy</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Items to revisit</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {debriefs.map((d) => (
          <Table.Row key={d.sessionId}>
            <Table.RowHeaderCell>
              <Link to={routes.debrief.build(d.sessionId)}>{d.bankTitle}</Link>
            </Table.RowHeaderCell>
            <Table.Cell>{d.className ?? 'Ad-hoc group'}</Table.Cell>
            <Table.Cell>{formatDateTime(d.playedAt)}</Table.Cell>
            <Table.Cell>{d.playerCount}</Table.Cell>
            <Table.Cell>
              <FigureText figure={d.classAccuracy} format={formatShare} />
            </Table.Cell>
            <Table.Cell>{d.revisitCount}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
