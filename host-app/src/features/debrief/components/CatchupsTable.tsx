import type { CatchupSummaryDto } from '@covalent/shared-types';
import { Button, Flex, Table } from '@radix-ui/themes';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import { boxCountsText } from '../utils/catchupLabels';
import { CatchupSummaryCells, CatchupSummaryHeaders } from './CatchupSummaryCells';

export interface CatchupsTableProps {
  catchups: CatchupSummaryDto[];
  /** Ids whose results are showing. */
  expanded: ReadonlySet<string>;
  resultsIdFor: (catchupId: string) => string;
  onToggleResults: (catchupId: string) => void;
  onClose: (catchupId: string) => void;
  closingId: string | null;
}

/** A session's catch-ups with how far the class has got, each with its results and a close action. */
export function CatchupsTable({ catchups, expanded, resultsIdFor, onToggleResults, onClose, closingId }: CatchupsTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Catch-ups of this session</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Code</Table.ColumnHeaderCell>
          <CatchupSummaryHeaders />
          <Table.ColumnHeaderCell>Cards per box</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>
            <span className="visually-hidden">Actions</span>
          </Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {catchups.map((c) => {
          const open = expanded.has(c.id);
          return (
            <Table.Row key={c.id}>
              <Table.RowHeaderCell>{c.code}</Table.RowHeaderCell>
              <CatchupSummaryCells catchup={c} />
              <Table.Cell>{boxCountsText(c.boxCounts)}</Table.Cell>
              <Table.Cell>
                <Flex gap="2" justify="end">
                  <Button
                    size="1"
                    variant="soft"
                    aria-label={`Results for catch-up ${c.code}`}
                    aria-expanded={open}
                    aria-controls={open ? resultsIdFor(c.id) : undefined}
                    onClick={() => onToggleResults(c.id)}
                  >
                    Results
                  </Button>
                  {!c.closedAt && (
                    <ConfirmButton
                      label="Close"
                      ariaLabel={`Close catch-up ${c.code}`}
                      title={`Close catch-up ${c.code}?`}
                      description="Students can no longer open it with its code. What they have done so far stays in the results."
                      confirmLabel="Close catch-up"
                      disabled={closingId === c.id}
                      onConfirm={() => onClose(c.id)}
                    />
                  )}
                </Flex>
              </Table.Cell>
            </Table.Row>
          );
        })}
      </Table.Body>
    </Table.Root>
  );
}
