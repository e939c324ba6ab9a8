import type { CatchupSummaryDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { CatchupSummaryCells, CatchupSummaryHeaders } from './CatchupSummaryCells';

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
          <CatchupSummaryHeaders />
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {catchups.map((c) => (
          <Table.Row key={c.id}>
            <Table.RowHeaderCell>
              <Link to={routes.debrief.build(c.sessionId)}>{c.bankTitle}</Link>
            </Table.RowHeaderCell>
            <CatchupSummaryCells catchup={c} />
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
