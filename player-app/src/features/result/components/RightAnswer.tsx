import type { ItemKey, PlayerItemView } from '@covalent/shared-types';
import { describeKey } from '../utils/describeKey';

export interface RightAnswerProps {
  item: PlayerItemView;
  answerKey: ItemKey;
}

/** "The right answer" and the key: an order key as a numbered list of steps, others as lines. */
export function RightAnswer({ item, answerKey }: RightAnswerProps) {
  const lines = describeKey(item, answerKey);
  return (
    <>
      <h2 className="result-subtitle">The right answer</h2>
      {answerKey.type === 'order' ? (
        <ol className="result-key">
          {lines.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ol>
      ) : (
        lines.map((line) => (
          <p key={line} className="result-key">
            {line}
          </p>
        ))
      )}
    </>
  );
}
