import type { StudentSessionDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { FigureText } from '@/features/debrief/components/FigureText';
import { formatDateTime } from '@/features/debrief/utils/formatDate';
import { formatPercentValue } from '@/features/debrief/utils/formatPercentValue';
import { sessionSettingLabels } from '@/features/sessions/utils/sessionSettingLabels';
import { routes } from '@/routes';
import { formatScore } from '../utils/formatScore';
import { MissedItemsList } from './MissedItemsList';

export interface HistorySessionsTableProps {
  sessions: StudentSessionDto[];
}

/** One row per session the student played, oldest first, with the items they missed. */
export function HistorySessionsTable({ sessions }: HistorySessionsTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Sessions</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Played at</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Bank</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Format</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Score</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Percent</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Answered</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Missed</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Missed items</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {sessions.map((s) => (
          <Table.Row key={s.sessionId}>
            <Table.Cell>{formatDateTime(s.playedAt)}</Table.Cell>
            <Table.RowHeaderCell>
              <Link to={routes.debrief.build(s.sessionId)}>{s.bankTitle}</Link>
            </Table.RowHeaderCell>
            <Table.Cell>{sessionSettingLabels.format[s.format].title}</Table.Cell>
            <Table.Cell>{formatScore(s.score)}</Table.Cell>
            <Table.Cell>
              <FigureText figure={s.percent} format={formatPercentValue} />
            </Table.Cell>
            <Table.Cell>
              {s.answered} of {s.itemCount}
            </Table.Cell>
            <Table.Cell>{s.missed.length}</Table.Cell>
            <Table.Cell>
              <MissedItemsList missed={s.missed} />
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
