import { create } from 'zustand';
import type {
  PlayerReveal,
  PlayerServerEvents,
  PlayerSessionView,
  RoundTiming,
  SessionStatus,
  VoteView,
} from '@covalent/shared-types';

export type RoundView = NonNullable<PlayerSessionView['round']>;
export type OwnStanding = PlayerSessionView['ownStanding'];
export type YourAnswer = RoundView['yourAnswer'];
type Payload<E extends keyof PlayerServerEvents> = Parameters<PlayerServerEvents[E]>[0];

export interface GameData {
  /** False until the first `session:state` arrives. */
  loaded: boolean;
  sessionId: string | null;
  status: SessionStatus;
  format: PlayerSessionView['format'];
  you: PlayerSessionView['you'] | null;
  team: PlayerSessionView['team'];
  round: RoundView | null;
  ownStanding: OwnStanding;
  standings: PlayerSessionView['standings'];
  summary: PlayerSessionView['summary'];
  /** Set when the host removed this player. */
  removedMessage: string | null;
}

export interface GameState extends GameData {
  applySessionState: (view: PlayerSessionView) => void;
  applyRoundOpened: (payload: Payload<'round:opened'>) => void;
  applyTiming: (timing: RoundTiming) => void;
  applyVotes: (payload: Payload<'round:votes'>) => void;
  applyCall: (payload: Payload<'round:call'>) => void;
  applyClosed: (payload: Payload<'round:closed'>) => void;
  applyRevealed: (reveal: PlayerReveal) => void;
  applyStandings: (payload: Payload<'standings:update'>) => void;
  applyStatus: (status: SessionStatus) => void;
  applyRemoved: (message: string) => void;
  /** Records an answer the server acknowledged. */
  setYourAnswer: (roundIndex: number, answer: NonNullable<YourAnswer>) => void;
  markLocked: (roundIndex: number) => void;
  reset: () => void;
}

const initial: GameData = {
  loaded: false,
  sessionId: null,
  status: 'lobby',
  format: 'solo',
  you: null,
  team: null,
  round: null,
  ownStanding: null,
  standings: [],
  summary: { answered: 0, correct: 0, points: 0, itemCount: 0 },
  removedMessage: null,
};

/** Patches the round only when the message is about the round on screen; late messages are dropped. */
function patchRound(
  round: RoundView | null,
  roundIndex: number,
  patch: (round: RoundView) => RoundView,
): RoundView | null {
  return round && round.timing.roundIndex === roundIndex ? patch(round) : round;
}

/** The live session as this player sees it. Written only by `src/realtime/`. */
export const useGameStore = create<GameState>()((set) => ({
  ...initial,
  applySessionState: (view) =>
    set({
      loaded: true,
      sessionId: view.sessionId,
      status: view.status,
      format: view.format,
      you: view.you,
      team: view.team,
      round: view.round,
      ownStanding: view.ownStanding,
      standings: view.standings,
      summary: view.summary,
    }),
  applyRoundOpened: ({ roundIndex, itemCount, item, timing, calledPlayerId }) =>
    set({
      round: {
        timing: { ...timing, roundIndex },
        item,
        itemCount,
        calledPlayerId,
        votes: [],
        yourAnswer: null,
        reveal: null,
      },
    }),
  applyTiming: (timing) =>
    set((s) => ({ round: patchRound(s.round, timing.roundIndex, (r) => ({ ...r, timing })) })),
  applyVotes: ({ roundIndex, teamId, votes }) =>
    set((s) =>
      s.team && s.team.id !== teamId
        ? {}
        : { round: patchRound(s.round, roundIndex, (r) => ({ ...r, votes })) },
    ),
  applyCall: ({ roundIndex, calledPlayerId }) =>
    set((s) => ({ round: patchRound(s.round, roundIndex, (r) => ({ ...r, calledPlayerId })) })),
  applyClosed: ({ roundIndex }) =>
    set((s) => ({
      round: patchRound(s.round, roundIndex, (r) =>
        r.timing.status === 'revealed'
          ? r
          : { ...r, timing: { ...r.timing, status: 'closed', deadlineAt: null, paused: false } },
      ),
    })),
  applyRevealed: (reveal) =>
    set((s) => {
      const round = s.round;
      if (!round || round.timing.roundIndex !== reveal.roundIndex) return {};
      // The protocol pushes totals only in `session:state`; count each reveal once here.
      const fresh = round.reveal === null;
      const you = reveal.you;
      return {
        round: { ...round, reveal, timing: { ...round.timing, status: 'revealed', deadlineAt: null } },
        summary:
          fresh && you
            ? {
                ...s.summary,
                answered: s.summary.answered + (you.answered ? 1 : 0),
                correct: s.summary.correct + (you.correct ? 1 : 0),
                points: s.summary.points + you.points,
              }
            : s.summary,
      };
    }),
  applyStandings: ({ own, standings }) => set({ ownStanding: own, standings }),
  applyStatus: (status) => set({ status }),
  applyRemoved: (message) => set({ removedMessage: message }),
  setYourAnswer: (roundIndex, answer) =>
    set((s) => ({ round: patchRound(s.round, roundIndex, (r) => ({ ...r, yourAnswer: answer })) })),
  markLocked: (roundIndex) =>
    set((s) => ({
      round: patchRound(s.round, roundIndex, (r) => ({
        ...r,
        yourAnswer: r.yourAnswer ? { ...r.yourAnswer, locked: true } : r.yourAnswer,
        votes: r.votes.map((v) => (v.playerId === s.you?.playerId ? { ...v, locked: true } : v)),
      })),
    })),
  reset: () => set(initial),
}));

/** This player's own huddle vote, if the team's votes include it. */
export function ownVote(votes: readonly VoteView[], playerId: string | undefined): VoteView | undefined {
  return votes.find((v) => v.playerId === playerId);
}
