import type { CatchupCardResultDto } from '@covalent/shared-types';
import { Table } from '@radix-ui/themes';
import { lastResultText } from '../utils/catchupLabels';
import { formatDateTime } from '../utils/formatDate';

/** The column headers of a catch-up card's figures, in the order CatchupCardCells fills them. */
export function CatchupCardHeaders() {
  return (
    <>
      <Table.ColumnHeaderCell>Box</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Attempts</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Right</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Last result</Table.ColumnHeaderCell>
      <Table.ColumnHeaderCell>Next due</Table.ColumnHeaderCell>
    </>
  );
}

/** One card's box, attempts, right answers, last result and next review: shared by the debrief's and the history's tables. */
export function CatchupCardCells({ card }: { card: CatchupCardResultDto }) {
  return (
    <>
      <Table.Cell>{card.box}</Table.Cell>
      <Table.Cell>{card.attempts}</Table.Cell>
      <Table.Cell>{card.correctAttempts}</Table.Cell>
      <Table.Cell>{lastResultText(card)}</Table.Cell>
      <Table.Cell>{formatDateTime(card.dueAt)}</Table.Cell>
    </>
  );
}
