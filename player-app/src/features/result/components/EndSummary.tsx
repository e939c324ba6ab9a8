import { leaveSession } from '@/realtime';
import { useGameStore } from '@/stores/useGameStore';
import { formatPoints } from '../utils/describeKey';
import { StandingCard } from './StandingCard';

/** The end of the session: your own totals and your team's place. */
export function EndSummary() {
  const summary = useGameStore((s) => s.summary);
  const standing = useGameStore((s) => s.ownStanding);
  const teamName = useGameStore((s) => s.team?.name ?? null);
  return (
    <section className="end" aria-labelledby="end-title">
      <h1 id="end-title" className="page-title">
        That's the end of the review
      </h1>
      <dl className="result-points">
        <div>
          <dt>Answered</dt>
          <dd>
            {summary.answered} of {summary.itemCount}
          </dd>
        </div>
        <div>
          <dt>Correct</dt>
          <dd>{summary.correct}</dd>
        </div>
        <div>
          <dt>Your points</dt>
          <dd>{formatPoints(summary.points)}</dd>
        </div>
      </dl>
      {standing && <StandingCard standing={standing} teamName={teamName} final />}
      <p className="field-hint">This was practice: it helps your teacher see what to go over again.</p>
      <button type="button" className="button-secondary" onClick={leaveSession}>
        Join another session
      </button>
    </section>
  );
}
