import { useGameStore, type RoundView } from '@/stores/useGameStore';
import { describeResponse } from '../utils/describeResponse';

export interface RoundWaitingProps {
  round: RoundView;
}

/** Between open and reveal (closed), or before a round opens (ready). */
export function RoundWaiting({ round }: RoundWaitingProps) {
  const format = useGameStore((s) => s.format);
  const playerId = useGameStore((s) => s.you?.playerId);
  const answer =
    round.yourAnswer?.response ??
    (format === 'huddle' ? round.votes.find((v) => v.playerId === playerId)?.response : undefined);
  const closed = round.timing.status === 'closed';
  return (
    <section className="waiting" aria-labelledby="waiting-title">
      <p className="round-count">
        Round {round.timing.roundIndex + 1} of {round.itemCount}
      </p>
      <h1 id="waiting-title" className="prompt">
        {closed ? 'Round closed' : 'Get ready — the next round opens soon'}
      </h1>
      {closed && (
        <>
          <p>{round.item.prompt}</p>
          <p>{answer ? `Your answer: ${describeResponse(round.item, answer)}` : 'No answer from you this round.'}</p>
          <p>Your teacher will reveal the answer in a moment.</p>
        </>
      )}
    </section>
  );
}
