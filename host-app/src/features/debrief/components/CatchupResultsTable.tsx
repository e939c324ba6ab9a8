import type { CatchupResultsDto } from '@covalent/shared-types';
import { Table, Text } from '@radix-ui/themes';
import { CatchupCardCells, CatchupCardHeaders } from './CatchupCardCells';

export interface CatchupResultsTableProps {
  results: CatchupResultsDto;
}

/** One row per student and card, students by name, cards in the server's order. */
export function CatchupResultsTable({ results }: CatchupResultsTableProps) {
  const students = [...results.students].sort((a, b) => a.displayName.localeCompare(b.displayName));
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Catch-up results {results.code}</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Student</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Item</Table.ColumnHeaderCell>
          <CatchupCardHeaders />
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {students.length === 0 && (
          <Table.Row>
            <Table.Cell colSpan={7}>
              <Text color="gray">No student has cards in this catch-up.</Text>
            </Table.Cell>
          </Table.Row>
        )}
        {students.flatMap((s) =>
          s.items.map((card) => (
            <Table.Row key={`${s.rosterEntryId}:${card.itemId}`}>
              <Table.RowHeaderCell>{s.displayName}</Table.RowHeaderCell>
              <Table.Cell>{card.prompt}</Table.Cell>
              <CatchupCardCells card={card} />
            </Table.Row>
          )),
        )}
      </Table.Body>
    </Table.Root>
  );
}
