import type { CatchupCardResultDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { CatchupCardCells, CatchupCardHeaders } from '@/features/debrief/components/CatchupCardCells';

export interface CatchupItemsTableProps {
  caption: string;
  items: CatchupCardResultDto[];
}

/** One student's cards in one catch-up. */
export function CatchupItemsTable({ caption, items }: CatchupItemsTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">{caption}</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Item</Table.ColumnHeaderCell>
          <CatchupCardHeaders />
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {items.map((card) => (
          <Table.Row key={card.itemId}>
            <Table.RowHeaderCell>{card.prompt}</Table.RowHeaderCell>
            <CatchupCardCells card={card} />
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
