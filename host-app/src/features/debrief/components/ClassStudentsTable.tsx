import type { ClassStudentTrendDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { formatPercentValue } from '../utils/formatPercentValue';
import { FigureText } from './FigureText';

export interface ClassStudentsTableProps {
  classId: string;
  students: ClassStudentTrendDto[];
}

/** Every student on the class list, each opening their history. */
export function ClassStudentsTable({ classId, students }: ClassStudentsTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Students of the class</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Student</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Sessions played</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Mean percent</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Catch-up cards open</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Catch-up cards cleared</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {students.map((s) => (
          <Table.Row key={s.rosterEntryId}>
            <Table.RowHeaderCell>
              <Link to={routes.studentHistory.build(classId, s.rosterEntryId)}>{s.displayName}</Link>
            </Table.RowHeaderCell>
            <Table.Cell>{s.sessionsPlayed}</Table.Cell>
            <Table.Cell>
              <FigureText figure={s.meanPercent} format={formatPercentValue} />
            </Table.Cell>
            <Table.Cell>{s.openCards}</Table.Cell>
            <Table.Cell>{s.clearedCards}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
