import type {
  AnswerDistribution,
  HostSessionView,
  ItemResponse,
  PlayerItemView,
  PlayerReveal,
  PlayerSessionView,
  RoundTiming,
  SessionDto,
  StandingRow,
  TeamView,
  VoteView,
} from '@covalent/shared-types';
import { createRng, shuffle } from '../../mixer/domain';
import { sessionImageUrl } from '../../media/media.mapper';
import { canonicalJson, type RoundResults, type RoundState, type StandingEntry } from '../domain';
import { REVISIT_BELOW_P } from '../sessions.constants';
import type { LiveSession, LiveTeam } from './live-session';

/** The item as players see it: no key, no explanation; order steps shuffled (seeded, so every client and a restart agree). */
export function itemView(s: LiveSession, index: number): PlayerItemView {
  const item = s.meta.items[index];
  const options = item.type === 'order' ? shuffle(item.options, createRng(`${s.meta.seed}:order:${index}`)) : item.options;
  return {
    type: item.type,
    prompt: item.prompt,
    options: options.map((o) => ({ id: o.id, text: o.text })),
    unitHint: item.key.type === 'numeric' ? item.key.unit : null,
    imageUrl: item.imageId ? sessionImageUrl(s.id, item.imageId) : null,
  };
}

export function sessionDto(s: LiveSession): SessionDto {
  const m = s.meta;
  return {
    id: m.id,
    joinCode: m.joinCode,
    status: s.engine.status,
    bankId: m.bankId ?? '',
    bankTitle: m.bankTitle,
    classId: m.classId,
    className: m.className,
    format: m.format,
    roundSeconds: m.settings.roundSeconds,
    speedWeight: m.settings.speedWeight,
    standings: m.settings.standings,
    mixerMode: m.settings.mixerMode,
    namePack: m.settings.namePack,
    itemCount: m.items.length,
    playerCount: s.activePlayers().length,
    createdAt: m.createdAt.toISOString(),
    endedAt: m.endedAt?.toISOString() ?? null,
  };
}

export function teamView(s: LiveSession, team: LiveTeam): TeamView {
  return {
    id: team.id,
    name: team.name,
    colour: team.colour,
    pattern: team.pattern,
    members: s.membersOf(team.id).map((p) => ({ playerId: p.id, nickname: p.nickname, number: p.number ?? 0, status: s.statusOf(p.id) })),
  };
}

export function standingRows(entries: readonly StandingEntry[]): StandingRow[] {
  return entries.map((e) => ({ teamId: e.teamId, name: e.name, rank: e.rank, points: e.points, correctAnswers: e.correctAnswers }));
}

/** A player's (solo) or team's deadline; the host gets the round's last one. */
export function timing(s: LiveSession, round: RoundState, playerId: string | null): RoundTiming {
  const now = s.clock.now();
  let deadlineAt: number | null = null;
  let limitMs = s.engine.config.roundLimitMs + round.addedMs;
  if (round.status === 'open') {
    if (playerId) {
      const d = s.engine.deadlineFor(playerId);
      if (d) ({ deadlineAt, limitMs } = d);
    } else {
      for (const d of s.engine.deadlines()) {
        if (deadlineAt === null || d.deadlineAt > deadlineAt) ({ deadlineAt, limitMs } = d);
      }
    }
  }
  return { roundIndex: round.index, status: round.status, deadlineAt, limitMs, paused: s.engine.status === 'paused', serverNow: now };
}

function votesOf(s: LiveSession, round: RoundState, teamId: string): VoteView[] {
  return round.answers
    .filter((a) => a.teamId === teamId && s.statusOf(a.playerId) !== 'removed')
    .map((a) => ({ playerId: a.playerId, response: a.response as ItemResponse, locked: a.locked }));
}

function calledFor(round: RoundState, teamId: string | null): string | null {
  return (teamId && round.calls.find((c) => c.teamId === teamId)?.playerId) || null;
}

export function playerReveal(s: LiveSession, roundIndex: number, results: RoundResults, playerId: string): PlayerReveal {
  const item = s.meta.items[roundIndex];
  const mine = results.players.find((p) => p.playerId === playerId);
  const teamId = mine?.teamId ?? s.players.get(playerId)?.teamId ?? null;
  const team = results.teams.find((t) => t.teamId === teamId);
  return {
    roundIndex,
    key: item.key,
    explanation: item.explanation,
    you: mine
      ? { answered: mine.answered, response: (mine.response as ItemResponse | null) ?? null, credit: mine.credit, correct: mine.correct, points: mine.points }
      : null,
    team: {
      answer: (team?.answer as ItemResponse | null) ?? null,
      // A team that gave no answer was not wrong: its phones say "No answer from your team".
      correct: team && team.answer !== null ? team.correct : null,
      points: team?.points ?? 0,
      unity: team?.unity ?? false,
    },
  };
}

function playerSummary(s: LiveSession, playerId: string): PlayerSessionView['summary'] {
  let answered = 0;
  let correct = 0;
  let points = 0;
  for (const results of s.revealed.values()) {
    const r = results.players.find((p) => p.playerId === playerId);
    if (!r) continue;
    if (r.answered) answered++;
    if (r.correct) correct++;
    points += r.points;
  }
  // Ended early, the rounds never played are not "missed": count the rounds the class played.
  const itemCount = s.engine.status === 'ended' ? s.revealed.size : s.meta.items.length;
  return { answered, correct, points, itemCount };
}

export function playerView(s: LiveSession, playerId: string, round: RoundState | null = s.engine.peekRound()): PlayerSessionView {
  const p = s.players.get(playerId);
  if (!p) throw new Error(`unknown player ${playerId}`);
  const team = p.teamId ? s.teams.find((t) => t.id === p.teamId) : undefined;
  const own = s.engine.playerStanding(playerId);
  let roundView: PlayerSessionView['round'] = null;
  if (round) {
    const answer = round.answers.find((a) => a.playerId === playerId);
    const results = s.revealed.get(round.index);
    roundView = {
      timing: timing(s, round, playerId),
      item: itemView(s, round.index),
      itemCount: s.meta.items.length,
      calledPlayerId: calledFor(round, p.teamId),
      votes: s.meta.format === 'huddle' && p.teamId ? votesOf(s, round, p.teamId) : [],
      yourAnswer: answer ? { response: answer.response as ItemResponse, locked: answer.locked } : null,
      reveal: round.status === 'revealed' && results ? playerReveal(s, round.index, results, playerId) : null,
    };
  }
  return {
    sessionId: s.id,
    status: s.engine.status,
    format: s.meta.format,
    you: { playerId, nickname: p.nickname, teamId: p.teamId, number: p.number },
    team: team ? teamView(s, team) : null,
    round: roundView,
    ownStanding: own ? { rank: own.rank, points: own.points, teamCount: own.teamCount } : null,
    standings: standingRows(s.engine.classStandings()),
    summary: playerSummary(s, playerId),
    serverNow: s.clock.now(),
  };
}

/** Share of each option (choice items) or of the commonest answers (others), over the players counted in the round. */
export function answerDistribution(s: LiveSession, roundIndex: number, results: RoundResults): AnswerDistribution {
  const item = s.meta.items[roundIndex];
  const answered = results.players.filter((p) => p.answered && p.response !== null);
  const responses = answered.map((p) => p.response as ItemResponse);
  const key = item.key;
  if (item.type === 'single' || item.type === 'multi') {
    const correctIds = key.type === 'single' ? [key.correctOptionId] : key.type === 'multi' ? key.correctOptionIds : [];
    return {
      total: answered.length,
      counts: item.options.map((o) => ({
        label: o.text,
        optionId: o.id,
        count: responses.filter((r) => (r.type === 'single' ? r.optionId === o.id : r.type === 'multi' && r.optionIds.includes(o.id))).length,
        correct: correctIds.includes(o.id),
      })),
    };
  }
  if (item.type === 'truefalse') {
    return {
      total: answered.length,
      counts: [true, false].map((value) => ({
        label: value ? 'True' : 'False',
        optionId: null,
        count: responses.filter((r) => r.type === 'truefalse' && r.value === value).length,
        correct: key.type === 'truefalse' && key.value === value,
      })),
    };
  }
  const groups = new Map<string, { label: string; count: number; correct: boolean }>();
  for (const p of answered) {
    const r = p.response as ItemResponse;
    const label =
      r.type === 'order'
        ? r.sequence.map((id) => item.options.find((o) => o.id === id)?.text ?? '?').join(' → ')
        : r.type === 'numeric' || r.type === 'text'
          ? r.text.trim().replace(/\s+/g, ' ').toLowerCase()
          : canonicalJson(r);
    const g = groups.get(label) ?? { label, count: 0, correct: p.correct };
    g.count++;
    groups.set(label, g);
  }
  const counts = [...groups.values()].sort((a, b) => b.count - a.count || a.label.localeCompare(b.label)).slice(0, 6);
  return { total: answered.length, counts: counts.map((c) => ({ ...c, optionId: null })) };
}

function endSummary(s: LiveSession): HostSessionView['summary'] {
  if (s.engine.status !== 'ended') return null;
  const credits: number[] = [];
  const perItem: { itemId: string; prompt: string; p: number | null }[] = [];
  for (let i = 0; i < s.meta.items.length; i++) {
    const results = s.engine.roundResults(i);
    if (!results) continue;
    const c = results.players.map((p) => p.credit);
    credits.push(...c);
    perItem.push({ itemId: s.meta.items[i].id, prompt: s.meta.items[i].prompt, p: c.length ? c.reduce((a, b) => a + b, 0) / c.length : null });
  }
  return {
    accuracy: credits.length ? credits.reduce((a, b) => a + b, 0) / credits.length : null,
    itemsToRevisit: perItem.filter((i) => i.p !== null && i.p < REVISIT_BELOW_P).sort((a, b) => (a.p ?? 0) - (b.p ?? 0)),
  };
}

export function hostView(s: LiveSession): HostSessionView {
  const round = s.engine.peekRound();
  let roundView: HostSessionView['round'] = null;
  if (round) {
    const results = s.revealed.get(round.index);
    const locked = new Set(round.answers.filter((a) => a.locked).map((a) => a.playerId));
    roundView = {
      timing: timing(s, round, null),
      itemIndex: round.index,
      itemCount: s.meta.items.length,
      itemId: s.meta.items[round.index].id,
      tags: s.meta.items[round.index].tags,
      item: itemView(s, round.index),
      progress: s.teams.map((t) => {
        const members = round.roster.filter((r) => r.teamId === t.id && s.statusOf(r.playerId) !== 'removed');
        return { teamId: t.id, answered: members.filter((m) => locked.has(m.playerId)).length, members: members.length };
      }),
      reveal:
        round.status === 'revealed' && results
          ? { key: s.meta.items[round.index].key, explanation: s.meta.items[round.index].explanation, distribution: answerDistribution(s, round.index, results) }
          : null,
    };
  }
  return {
    session: sessionDto(s),
    joiningLocked: s.meta.joiningLocked,
    teams: s.teams.map((t) => teamView(s, t)),
    unplaced: s.activePlayers().filter((p) => p.teamId === null).map((p) => ({ playerId: p.id, nickname: p.nickname })),
    mixer: s.meta.mixerSummary,
    round: roundView,
    standings: standingRows(s.engine.classStandings()),
    summary: endSummary(s),
    serverNow: s.clock.now(),
  };
}
