import { NOT_ENOUGH_DATA } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import type { TrendRow } from '../utils/trendRows';

export interface TagTrendTableProps {
  tags: string[];
  rows: TrendRow[];
}

/** The chart's numbers as a table: one row per session, one column per tag. */
export function TagTrendTable({ tags, rows }: TagTrendTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Accuracy by tag per session</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Session</Table.ColumnHeaderCell>
          {tags.map((t) => (
            <Table.ColumnHeaderCell key={t}>{t}</Table.ColumnHeaderCell>
          ))}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((r) => (
          <Table.Row key={r.sessionId}>
            <Table.RowHeaderCell>
              {r.label} · {r.bankTitle}
            </Table.RowHeaderCell>
            {tags.map((t) => {
              const cell = r.cells[t];
              const text = !cell?.played ? 'not played' : cell.percent === null ? NOT_ENOUGH_DATA : `${cell.percent}%`;
              return <Table.Cell key={t}>{text}</Table.Cell>;
            })}
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
