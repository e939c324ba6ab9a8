import { useEffect, useRef } from 'react';
import type { CatchupAnswerResponse, CatchupItemView, ItemResponse } from '@covalent/shared-types';
import { RightAnswer } from '@/features/result';
import { describeResponse } from '@/features/round';

export interface CatchupFeedbackProps {
  item: CatchupItemView;
  feedback: CatchupAnswerResponse;
  /** The student's own answer, shown under the right one. */
  answered: ItemResponse | null;
  last: boolean;
  onNext: () => void;
}

/** Right or not in words, the right answer and the explanation, then on to the next item. */
export function CatchupFeedback({ item, feedback, answered, last, onNext }: CatchupFeedbackProps) {
  const heading = useRef<HTMLHeadingElement>(null);
  const partly = !feedback.correct && feedback.credit > 0;
  const tone = feedback.correct ? 'right' : 'wrong';

  useEffect(() => {
    heading.current?.focus();
  }, [item.itemId]);

  return (
    <section className="result" aria-labelledby="catchup-verdict">
      <h1 id="catchup-verdict" ref={heading} tabIndex={-1} className={`verdict verdict-${tone}`}>
        <span className="verdict-icon" aria-hidden="true">
          {feedback.correct ? '✓' : partly ? '◐' : '✗'}
        </span>
        {feedback.correct ? 'Correct' : partly ? 'Partly correct' : 'Incorrect'}
      </h1>
      <p className="result-prompt">{item.prompt}</p>
      <RightAnswer item={item} answerKey={feedback.key} />
      {answered && <p>Your answer: {describeResponse(item, answered)}</p>}
      {feedback.explanation && (
        <>
          <h2 className="result-subtitle">Why</h2>
          <p>{feedback.explanation}</p>
        </>
      )}
      <div className="answer-actions">
        <button type="button" className="button-primary" onClick={onNext}>
          {last ? 'See how you did' : 'Next item'}
        </button>
      </div>
    </section>
  );
}
