import type { DistractorTableDto } from '@covalent/shared-types';
import { Badge, Flex, Table } from '@radix-ui/themes';
import { formatShare } from '../utils/formatFigure';
import { FigureText } from './FigureText';

export interface DistractorTableProps {
  table: DistractorTableDto;
}

/** Who chose each option, overall and in the upper and lower 27%; marks are words, not colours. */
export function DistractorTable({ table }: DistractorTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Distractor analysis</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Option</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Text</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Overall</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Upper 27%</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Lower 27%</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Notes</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {table.rows.map((r) => (
          <Table.Row key={r.optionId}>
            <Table.RowHeaderCell>{r.letter}</Table.RowHeaderCell>
            <Table.Cell>{r.text}</Table.Cell>
            <Table.Cell>{formatShare(r.overall)}</Table.Cell>
            <Table.Cell>
              <FigureText figure={r.upper} format={formatShare} />
            </Table.Cell>
            <Table.Cell>
              <FigureText figure={r.lower} format={formatShare} />
            </Table.Cell>
            <Table.Cell>
              <Flex gap="1" wrap="wrap">
                {r.isKey && (
                  <Badge color="green" variant="solid">
                    key
                  </Badge>
                )}
                {r.nonFunctional && (
                  <Badge color="gray" variant="soft">
                    non-functional (under 5%)
                  </Badge>
                )}
                {r.review && (
                  <Badge color="amber" variant="soft">
                    review: draws the upper group
                  </Badge>
                )}
              </Flex>
            </Table.Cell>
          </Table.Row>
        ))}
        <Table.Row>
          <Table.RowHeaderCell>—</Table.RowHeaderCell>
          <Table.Cell>No answer</Table.Cell>
          <Table.Cell>{formatShare(table.notAnswered.overall)}</Table.Cell>
          <Table.Cell>
            <FigureText figure={table.notAnswered.upper} format={formatShare} />
          </Table.Cell>
          <Table.Cell>
            <FigureText figure={table.notAnswered.lower} format={formatShare} />
          </Table.Cell>
          <Table.Cell />
        </Table.Row>
      </Table.Body>
    </Table.Root>
  );
}
