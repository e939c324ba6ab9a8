import { useEffect, useRef, useState, type ReactNode } from 'react';
import type { ItemResponse } from '@covalent/shared-types';
import { ownVote, useGameStore, type RoundView } from '@/stores/useGameStore';
import { useAnswerSender } from '../hooks/useAnswerSender';
import { emptyDraft, isCompleteDraft } from '../utils/answerDraft';
import { describeResponse, sameResponse } from '../utils/describeResponse';
import { ChoiceAnswer } from './ChoiceAnswer';
import { Countdown } from './Countdown';
import { OptionsPreview } from './OptionsPreview';
import { OrderAnswer } from './OrderAnswer';
import { TypedAnswer } from './TypedAnswer';
import { VoteNames } from './VoteNames';

export interface AnswerScreenProps {
  round: RoundView;
}

function startingDraft(round: RoundView, shared: ItemResponse | undefined): ItemResponse | null {
  return shared ?? round.yourAnswer?.response ?? emptyDraft(round.item);
}

/** The open round: the prompt, the countdown and, for whoever may answer, the controls. */
export function AnswerScreen({ round }: AnswerScreenProps) {
  const format = useGameStore((s) => s.format);
  const you = useGameStore((s) => s.you);
  const team = useGameStore((s) => s.team);
  const { item, timing } = round;
  const roundIndex = timing.roundIndex;
  const playerId = you?.playerId ?? '';
  const huddle = format === 'huddle';
  const mine = huddle ? ownVote(round.votes, playerId) : undefined;
  const shared = mine?.response ?? (huddle ? round.yourAnswer?.response : undefined);
  const locked = Boolean(mine?.locked || round.yourAnswer?.locked || (!huddle && round.yourAnswer));

  const [draft, setDraft] = useState<ItemResponse | null>(() => startingDraft(round, shared));
  const sender = useAnswerSender(roundIndex);
  const heading = useRef<HTMLHeadingElement>(null);

  // A new round moves focus to its prompt, so screen readers start there.
  useEffect(() => {
    heading.current?.focus();
  }, [roundIndex]);

  const calledMember = team?.members.find((m) => m.playerId === round.calledPlayerId);
  const mayAnswer = format !== 'numbered' || (round.calledPlayerId !== null && round.calledPlayerId === playerId);
  const instant = item.type === 'single' || item.type === 'truefalse';
  const disabled = locked || (sender.pending && !huddle);

  function change(next: ItemResponse) {
    setDraft(next);
    // Tapping an option is the answer in solo/numbered, and the vote in huddle.
    if (instant) void sender.send(next, huddle ? false : undefined);
  }

  function submit() {
    if (!isCompleteDraft(draft) || disabled) return;
    void sender.send(draft, huddle ? false : undefined);
  }

  function lockIn() {
    if (!isCompleteDraft(draft)) return;
    // The shared vote is what the team sees: lock it as is, or share and lock the new one.
    void (sameResponse(draft, shared) ? sender.lock() : sender.send(draft, true));
  }

  const members = team?.members ?? [];
  let controls: ReactNode;
  if (item.type === 'order') {
    controls = (
      <OrderAnswer
        item={item}
        sequence={draft?.type === 'order' ? draft.sequence : []}
        onChange={(sequence) => setDraft({ type: 'order', sequence })}
        disabled={disabled}
      />
    );
  } else if (item.type === 'numeric' || item.type === 'text') {
    controls = (
      <TypedAnswer
        kind={item.type}
        value={draft?.type === item.type ? draft.text : ''}
        onChange={(text) => setDraft({ type: item.type as 'numeric' | 'text', text })}
        onSubmit={submit}
        disabled={disabled}
        unitHint={item.type === 'numeric' ? item.unitHint : null}
      />
    );
  } else {
    controls = (
      <ChoiceAnswer
        item={item}
        value={draft}
        onChange={change}
        disabled={disabled}
        votes={huddle ? round.votes : null}
        members={members}
        playerId={playerId}
      />
    );
  }

  const otherVotes = huddle && !['single', 'multi', 'truefalse'].includes(item.type) ? round.votes : [];

  return (
    <section className="answer" aria-labelledby="round-prompt">
      <p className="round-count">
        Round {roundIndex + 1} of {round.itemCount}
      </p>
      <h1 id="round-prompt" ref={heading} tabIndex={-1} className="prompt">
        {item.prompt}
      </h1>
      {item.imageUrl && <img className="item-image" src={item.imageUrl} alt="Picture for this item" />}
      <Countdown timing={timing} />

      {mayAnswer ? (
        <>
          {controls}
          {otherVotes.length > 0 && (
            <div className="team-votes">
              <h2 className="team-votes-title">Your team's votes</h2>
              <ul>
                {otherVotes.map((vote) => (
                  <li key={vote.playerId}>
                    <VoteNames votes={[vote]} members={members} playerId={playerId} />:{' '}
                    {describeResponse(item, vote.response)}
                  </li>
                ))}
              </ul>
            </div>
          )}
          <div className="answer-actions">
            {!instant && !locked && (
              <button
                type="button"
                className={huddle ? 'button-secondary' : 'button-primary'}
                disabled={!isCompleteDraft(draft) || sender.pending}
                onClick={submit}
              >
                {huddle ? 'Share my vote' : 'Submit answer'}
              </button>
            )}
            {huddle && !locked && (
              <button
                type="button"
                className="button-primary"
                disabled={!isCompleteDraft(draft) || sender.pending}
                onClick={lockIn}
              >
                Lock in
              </button>
            )}
          </div>
        </>
      ) : (
        <>
          <p className="discuss" role="status">
            Discuss with your team — {calledMember?.nickname ?? 'your teammate'} answers this one.
          </p>
          <OptionsPreview item={item} />
        </>
      )}

      <div className="answer-status" aria-live="polite">
        {sender.message ? (
          <p className="form-error" role="alert">
            {sender.message}
          </p>
        ) : locked ? (
          <p className="answer-sent">
            {huddle ? 'Locked in' : 'Answer sent'}
            {draft && isCompleteDraft(draft) ? `: ${describeResponse(item, draft)}` : ''}. Wait for the reveal.
          </p>
        ) : sender.pending ? (
          <p>Sending…</p>
        ) : null}
      </div>
    </section>
  );
}
