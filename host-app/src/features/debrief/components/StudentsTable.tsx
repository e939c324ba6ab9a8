import type { DebriefStudentDto, MissedItemDto } from '@covalent/shared-types';
import { Flex, Switch, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import { useDeleteSessionPlayerData } from '../hooks/useDeleteSessionPlayerData';
import { formatPercentValue } from '../utils/formatPercentValue';
import { DeletePlayerDataStatus } from './DeletePlayerDataStatus';
import { FigureText } from './FigureText';

export interface StudentsTableProps {
  sessionId: string;
  students: DebriefStudentDto[];
}

const DELETE_DESCRIPTION =
  'Their answers and nickname in this session are deleted, with any catch-up cards made from this session. The debrief counts them as removed. This cannot be undone.';

const studentName = (s: DebriefStudentDto): string => s.rosterName ?? s.nickname;

/** "not answered" or "partial credit 0.90" when it says more than "missed"; null otherwise. */
function missNote(m: MissedItemDto): string | null {
  if (!m.answered) return 'not answered';
  return m.credit > 0 ? `partial credit ${m.credit.toFixed(2)}` : null;
}

/** One line per missed item; with `answers`, the student's answer beside the key under it. */
function MissedList({ missed, answers }: { missed: MissedItemDto[]; answers: boolean }) {
  if (missed.length === 0) return <Text color="gray">None</Text>;
  return (
    <ul style={{ margin: 0, paddingLeft: '1.1em' }}>
      {[...missed]
        .sort((a, b) => a.position - b.position)
        .map((m) => {
          const note = missNote(m);
          return (
            <li key={m.itemId}>
              <Text weight="bold">Item {m.position + 1}</Text> {m.prompt}
              {answers ? (
                <>
                  <br />
                  <Text size="2">
                    Answer: {m.answered ? m.answerText : 'not answered'} · Key: {m.keyText}
                    {m.credit > 0 && ` · partial credit ${m.credit.toFixed(2)}`}
                  </Text>
                </>
              ) : (
                note && <Text size="2" color="gray">{` (${note})`}</Text>
              )}
            </li>
          );
        })}
    </ul>
  );
}

/**
 * Each student's score and the items they missed, their answer beside the key on request;
 * a teacher can delete one student's data here.
 */
export function StudentsTable({ sessionId, students }: StudentsTableProps) {
  const sorted = [...students].sort((a, b) => studentName(a).localeCompare(studentName(b)));
  const remove = useDeleteSessionPlayerData(sessionId);
  // A class's answers to order items run to paragraphs; the table starts with one line per item.
  const [answers, setAnswers] = useState(false);
  return (
    <>
      <DeletePlayerDataStatus mutation={remove} />
      {/* Printing prints the table as the switch left it. */}
      <Text as="label" size="2" className="debrief-no-print">
        <Flex gap="2" align="center" pb="3">
          <Switch checked={answers} onCheckedChange={setAnswers} />
          Show each answer beside the key
        </Flex>
      </Text>
      <Table.Root variant="surface">
        <caption className="visually-hidden">Students</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Student</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Score</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Percent</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Answered</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Missed items</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell className="debrief-no-print">
              <span className="visually-hidden">Actions</span>
            </Table.ColumnHeaderCell>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {sorted.map((s) =>
            s.removed ? (
              <Table.Row key={s.playerId}>
                <Table.RowHeaderCell>{studentName(s)}</Table.RowHeaderCell>
                <Table.Cell colSpan={4}>
                  <Text color="gray">Data removed; in no figure.</Text>
                </Table.Cell>
                {/* Nothing left to delete. */}
                <Table.Cell className="debrief-no-print" />
              </Table.Row>
            ) : (
              <Table.Row key={s.playerId}>
                <Table.RowHeaderCell>
                  {studentName(s)}
                  {s.rosterName && s.rosterName !== s.nickname && (
                    <Text color="gray" size="2">
                      {' '}
                      ({s.nickname})
                    </Text>
                  )}
                </Table.RowHeaderCell>
                <Table.Cell>{s.score === null ? '—' : s.score.toFixed(2)}</Table.Cell>
                <Table.Cell>
                  <FigureText figure={s.percent} format={formatPercentValue} />
                </Table.Cell>
                <Table.Cell>{s.answered}</Table.Cell>
                <Table.Cell>
                  <MissedList missed={s.missed} answers={answers} />
                </Table.Cell>
                <Table.Cell className="debrief-no-print">
                  <ConfirmButton
                    label="Delete data"
                    ariaLabel={`Delete data of ${studentName(s)}`}
                    title={`Delete ${studentName(s)}'s data from this session?`}
                    description={DELETE_DESCRIPTION}
                    confirmLabel="Delete data"
                    disabled={remove.isPending}
                    onConfirm={() => remove.mutate({ playerId: s.playerId, name: studentName(s) })}
                  />
                </Table.Cell>
              </Table.Row>
            ),
          )}
        </Table.Body>
      </Table.Root>
    </>
  );
}
