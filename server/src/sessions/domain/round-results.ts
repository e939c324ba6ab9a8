import { roundPoints } from '../../scoring/domain/points';
import { pluralityChoice } from './huddle-vote';
import { unitWindowMs } from './timing';
import type {
  AnswerChecker,
  AnswerRecord,
  CheckResult,
  PlayerRoundResult,
  PlayerState,
  RosterEntry,
  RoundResults,
  RoundState,
  RoundUnit,
  SessionConfig,
  TeamRoundResult,
} from './types';

interface ResultContext {
  config: SessionConfig;
  round: RoundState;
  players: readonly PlayerState[];
  check: AnswerChecker;
}

/** Results of a closed round, by format (DESIGN.md §4 "Formats" and "Points"). */
export function computeRoundResults(ctx: ResultContext): RoundResults {
  switch (ctx.config.format) {
    case 'solo':
      return soloResults(ctx);
    case 'huddle':
      return huddleResults(ctx);
    case 'numbered':
      return numberedResults(ctx);
  }
}

/** Players of the round still on the roster at close; removed players drop out of the means. */
function countedRoster(ctx: ResultContext): RosterEntry[] {
  const removed = new Set(ctx.players.filter((p) => p.status === 'removed').map((p) => p.id));
  return ctx.round.roster.filter((r) => !removed.has(r.playerId));
}

function teamIdsInOrder(roster: readonly RosterEntry[]): string[] {
  return [...new Set(roster.map((r) => r.teamId))];
}

function unitOf(round: RoundState, id: string): RoundUnit {
  const unit = round.units.find((u) => u.id === id);
  if (!unit) throw new Error(`round ${round.index} has no unit ${id}`);
  return unit;
}

function answerOf(round: RoundState, playerId: string): AnswerRecord | undefined {
  return round.answers.find((a) => a.playerId === playerId);
}

function mean(values: readonly number[]): number {
  return values.length === 0 ? 0 : values.reduce((s, v) => s + v, 0) / values.length;
}

function playerResult(
  ctx: ResultContext,
  entry: RosterEntry,
  answer: AnswerRecord | undefined,
  limitMs: number,
  checked: CheckResult | null,
): PlayerRoundResult {
  const base = { roundIndex: ctx.round.index, itemId: ctx.round.itemId, playerId: entry.playerId, teamId: entry.teamId, limitMs };
  if (!answer || !checked) {
    return { ...base, answered: false, response: null, credit: 0, correct: false, points: 0, elapsedMs: null };
  }
  const points = roundPoints({
    credit: checked.credit,
    elapsedMs: answer.elapsedMs,
    limitMs,
    speedWeight: ctx.config.speedWeight,
  });
  return {
    ...base,
    answered: true,
    response: answer.response,
    credit: checked.credit,
    correct: checked.correct,
    points,
    elapsedMs: answer.elapsedMs,
  };
}

function checkAnswer(ctx: ResultContext, answer: AnswerRecord | undefined): CheckResult | null {
  return answer ? ctx.check(ctx.round.index, answer.response) : null;
}

function soloResults(ctx: ResultContext): RoundResults {
  const roster = countedRoster(ctx);
  const players = roster.map((entry) => {
    const answer = answerOf(ctx.round, entry.playerId);
    const limitMs = unitWindowMs(ctx.round, unitOf(ctx.round, entry.playerId));
    return playerResult(ctx, entry, answer, limitMs, checkAnswer(ctx, answer));
  });
  const teams = teamIdsInOrder(roster).map((teamId): TeamRoundResult => {
    const members = players.filter((p) => p.teamId === teamId);
    const exact = mean(members.map((m) => m.points));
    return {
      roundIndex: ctx.round.index,
      itemId: ctx.round.itemId,
      teamId,
      answer: null,
      credit: mean(members.map((m) => m.credit)),
      correct: null,
      correctShare: mean(members.map((m) => (m.correct ? 1 : 0))),
      points: Math.round(exact),
      exactPoints: exact,
      unity: false,
      responseMs: mean(members.map((m) => m.elapsedMs ?? m.limitMs)),
      limitMs: Math.max(...members.map((m) => m.limitMs)),
      calledPlayerId: null,
      memberCount: members.length,
    };
  });
  return { players, teams };
}

function huddleResults(ctx: ResultContext): RoundResults {
  const roster = countedRoster(ctx);
  const players: PlayerRoundResult[] = [];
  const teams: TeamRoundResult[] = [];
  for (const teamId of teamIdsInOrder(roster)) {
    const members = roster.filter((r) => r.teamId === teamId);
    const limitMs = unitWindowMs(ctx.round, unitOf(ctx.round, teamId));
    const memberResults = members.map((entry) => {
      const vote = answerOf(ctx.round, entry.playerId);
      return playerResult(ctx, entry, vote, limitMs, checkAnswer(ctx, vote));
    });
    players.push(...memberResults);

    const memberIds = new Set(members.map((m) => m.playerId));
    const log = ctx.round.voteLog.filter((v) => v.teamId === teamId && memberIds.has(v.playerId));
    const choice = pluralityChoice(log);
    const teamAnswer = choice === null ? undefined : ctx.round.answers.find((a) => memberIds.has(a.playerId) && a.choice === choice);
    const teamCheck = checkAnswer(ctx, teamAnswer);
    const unity = memberResults.length > 0 && memberResults.every((m) => m.answered && m.correct);
    const meanPoints = mean(memberResults.map((m) => m.points));
    const points = Math.round(meanPoints * (unity ? 1 + ctx.config.unityBonus : 1));
    teams.push({
      roundIndex: ctx.round.index,
      itemId: ctx.round.itemId,
      teamId,
      answer: teamAnswer?.response ?? null,
      credit: teamCheck?.credit ?? 0,
      correct: teamCheck?.correct ?? false,
      correctShare: teamCheck?.correct ? 1 : 0,
      points,
      exactPoints: points,
      unity,
      responseMs: mean(memberResults.map((m) => m.elapsedMs ?? limitMs)),
      limitMs,
      calledPlayerId: null,
      memberCount: members.length,
    });
  }
  return { players, teams };
}

function numberedResults(ctx: ResultContext): RoundResults {
  const roster = countedRoster(ctx);
  const players: PlayerRoundResult[] = [];
  const teams: TeamRoundResult[] = [];
  for (const teamId of teamIdsInOrder(roster)) {
    const limitMs = unitWindowMs(ctx.round, unitOf(ctx.round, teamId));
    const call = ctx.round.calls.find((c) => c.teamId === teamId);
    // One submission per team; it stands even if its author is removed later.
    const submission = ctx.round.answers.find((a) => a.teamId === teamId);
    const author = submission ? ctx.round.roster.find((r) => r.playerId === submission.playerId) : undefined;
    const checked = checkAnswer(ctx, submission);
    let result: PlayerRoundResult | null = null;
    if (submission && author) {
      result = playerResult(ctx, author, submission, limitMs, checked);
      players.push(result);
    }
    teams.push({
      roundIndex: ctx.round.index,
      itemId: ctx.round.itemId,
      teamId,
      answer: submission?.response ?? null,
      credit: checked?.credit ?? 0,
      correct: checked?.correct ?? false,
      correctShare: checked?.correct ? 1 : 0,
      points: result?.points ?? 0,
      exactPoints: result?.points ?? 0,
      unity: false,
      responseMs: result?.elapsedMs ?? limitMs,
      limitMs,
      calledPlayerId: submission?.playerId ?? call?.playerId ?? null,
      memberCount: roster.filter((r) => r.teamId === teamId).length,
    });
  }
  return { players, teams };
}
