import { nextReviewText } from '../utils/nextReviewText';

export interface CatchupFinishProps {
  right: number;
  total: number;
  nextDueAt: string | null;
  now: number;
}

/** The end of a run: how many were right and when to come back. */
export function CatchupFinish({ right, total, nextDueAt, now }: CatchupFinishProps) {
  const review = nextReviewText(nextDueAt, now);
  return (
    <section className="end" aria-labelledby="catchup-finish">
      <h1 id="catchup-finish" className="page-title">
        {total === 0 ? 'Nothing due right now' : 'All done for today'}
      </h1>
      <p>{total === 0 ? `${review[0]?.toUpperCase()}${review.slice(1)}.` : `${right} of ${total} right; ${review}.`}</p>
    </section>
  );
}
