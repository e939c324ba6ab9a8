import { useEffect, useRef } from 'react';
import type { PlayerReveal } from '@covalent/shared-types';
import { describeResponse } from '@/features/round';
import { useGameStore, type RoundView } from '@/stores/useGameStore';
import { formatPoints } from '../utils/describeKey';
import { RightAnswer } from './RightAnswer';
import { StandingCard } from './StandingCard';

export interface ResultScreenProps {
  round: RoundView;
  reveal: PlayerReveal;
}

type Verdict = { word: string; icon: string; tone: 'right' | 'partly' | 'wrong' | 'none' };

function verdictFor(reveal: PlayerReveal): Verdict {
  const you = reveal.you;
  if (!you) {
    // numbered: someone else answered for the team.
    if (reveal.team.correct === null) return { word: 'No answer from your team', icon: '–', tone: 'none' };
    return reveal.team.correct
      ? { word: 'Your team got it right', icon: '✓', tone: 'right' }
      : { word: "Your team's answer was not right", icon: '✗', tone: 'wrong' };
  }
  if (!you.answered) return { word: 'No answer this round', icon: '–', tone: 'none' };
  if (you.correct) return { word: 'Correct', icon: '✓', tone: 'right' };
  if (you.credit > 0) return { word: 'Partly correct', icon: '◐', tone: 'partly' };
  return { word: 'Incorrect', icon: '✗', tone: 'wrong' };
}

/** After the reveal: right or not in words, the right answer, the explanation and the points. */
export function ResultScreen({ round, reveal }: ResultScreenProps) {
  const format = useGameStore((s) => s.format);
  const standing = useGameStore((s) => s.ownStanding);
  const teamName = useGameStore((s) => s.team?.name ?? null);
  const heading = useRef<HTMLHeadingElement>(null);
  const verdict = verdictFor(reveal);

  useEffect(() => {
    heading.current?.focus();
  }, [reveal.roundIndex]);

  return (
    <section className="result" aria-labelledby="result-verdict">
      <p className="round-count">
        Round {reveal.roundIndex + 1} of {round.itemCount}
      </p>
      <h1 id="result-verdict" ref={heading} tabIndex={-1} className={`verdict verdict-${verdict.tone}`}>
        <span className="verdict-icon" aria-hidden="true">
          {verdict.icon}
        </span>
        {verdict.word}
      </h1>
      <p className="result-prompt">{round.item.prompt}</p>

      <RightAnswer item={round.item} answerKey={reveal.key} />
      {reveal.you?.response && (
        <p>Your answer: {describeResponse(round.item, reveal.you.response)}</p>
      )}
      {format === 'huddle' && reveal.team.answer && (
        <p>Your team's answer: {describeResponse(round.item, reveal.team.answer)}</p>
      )}

      {reveal.explanation && (
        <>
          <h2 className="result-subtitle">Why</h2>
          <p className="result-explanation">{reveal.explanation}</p>
        </>
      )}

      <dl className="result-points">
        {reveal.you && (
          <div>
            <dt>Your points</dt>
            <dd>{formatPoints(reveal.you.points)}</dd>
          </div>
        )}
        <div>
          <dt>Team points this round</dt>
          <dd>{formatPoints(reveal.team.points)}</dd>
        </div>
      </dl>
      {reveal.team.unity && <p>Everyone on your team chose the right answer: unity bonus.</p>}
      {standing && <StandingCard standing={standing} teamName={teamName} />}
    </section>
  );
}
