import type { DebriefTeamDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { formatShare } from '../utils/formatFigure';
import { FigureText } from './FigureText';

export interface TeamsTableProps {
  teams: DebriefTeamDto[];
}

/** Teams by points, with accuracy and how often every member agreed on the right answer. */
export function TeamsTable({ teams }: TeamsTableProps) {
  const sorted = [...teams].sort((a, b) => b.points - a.points || a.name.localeCompare(b.name));
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Teams</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Team</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Members</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Points</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Accuracy</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Unity rate</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {sorted.map((t) => (
          <Table.Row key={t.id}>
            <Table.RowHeaderCell>{t.name}</Table.RowHeaderCell>
            <Table.Cell>{t.memberCount}</Table.Cell>
            <Table.Cell>{t.points}</Table.Cell>
            <Table.Cell>
              <FigureText figure={t.accuracy} format={formatShare} />
            </Table.Cell>
            <Table.Cell>
              <FigureText figure={t.unityRate} format={formatShare} />
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
