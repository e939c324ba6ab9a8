import type { StudentSessionDto } from '@covalent/shared-types';
import { Text } from '@radix-ui/themes';

export interface MissedItemsListProps {
  missed: StudentSessionDto['missed'];
}

/** The items of one session without full credit: the student's answer beside the key. */
export function MissedItemsList({ missed }: MissedItemsListProps) {
  if (missed.length === 0) return <Text color="gray">None</Text>;
  return (
    <ul style={{ margin: 0, paddingLeft: '1.1em' }}>
      {missed.map((m) => (
        <li key={m.itemId}>
          {m.prompt}
          <br />
          <Text size="2">
            Answer: {m.answerText || 'not answered'} · Key: {m.keyText}
            {m.credit > 0 && ` · partial credit ${m.credit.toFixed(2)}`}
          </Text>
        </li>
      ))}
    </ul>
  );
}
