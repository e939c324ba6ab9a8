import {
  optionLetter,
  type DebriefDto,
  type DebriefItemDto,
  type DebriefStudentDto,
  type DebriefSummaryDto,
  type DebriefTeamDto,
  type DebriefUnit,
  type DistractorTableDto,
  type FigureDto,
  type ItemResponse,
  type MissedItemDto,
} from '@covalent/shared-types';
import type { SessionItem } from '../sessions/entities/session.entity';
import { REVISIT_BELOW_P } from '../sessions/sessions.constants';
import {
  NotComputedReason,
  analyseSession,
  type DebriefInput,
  type DebriefItem,
  type DebriefResponse,
  type ExamineeResult,
  type Figure,
  type ItemAnalysis,
  type SessionAnalysis,
} from './domain';
import { keyText, responseText } from './answer-text';
import type { DebriefSource, SourcePlayer } from './debrief-source';

/** Why a removed student has no figures. */
export const DATA_DELETED_REASON = 'the student\u2019s data was deleted';
const NOT_ON_A_TEAM_REASON = 'the student was not on a team';

const TRUE_FALSE_OPTIONS = [
  { id: 'true', text: 'True' },
  { id: 'false', text: 'False' },
];

/** Options as the distractor table sees them: a true/false item has two. */
function choiceOptions(item: SessionItem): { id: string; text: string }[] {
  if (item.type === 'single' || item.type === 'multi') return item.options;
  if (item.type === 'truefalse') return TRUE_FALSE_OPTIONS;
  return [];
}

function correctOptionIds(item: SessionItem): string[] {
  const { key } = item;
  if (key.type === 'single') return [key.correctOptionId];
  if (key.type === 'multi') return key.correctOptionIds;
  if (key.type === 'truefalse') return [String(key.value)];
  return [];
}

function chosenOptionIds(response: ItemResponse | null): string[] {
  if (!response) return [];
  if (response.type === 'single') return [response.optionId];
  if (response.type === 'multi') return [...new Set(response.optionIds)];
  if (response.type === 'truefalse') return [String(response.value)];
  return [];
}

/** multi and order give partial credit; numeric does when significant figures are required (DESIGN.md §5). */
function scoredAllOrNothing(item: SessionItem): boolean {
  if (item.type === 'multi' || item.type === 'order') return false;
  if (item.key.type === 'numeric') return item.key.sigFigs === null;
  return true;
}

/** The unit of analysis (DESIGN.md §6): in `numbered` only the called member answers, so the team is the unit. */
export function unitOf(source: DebriefSource): DebriefUnit {
  return source.session.format === 'numbered' ? 'team' : 'player';
}

/** Players in the debrief: everyone but those the host removed before they answered anything. */
function countedPlayers(source: DebriefSource): SourcePlayer[] {
  const answered = new Set(source.responses.map((r) => r.playerId));
  return source.players.filter((p) => p.deleted || !p.removedByHost || answered.has(p.id));
}

/** The response matrix of the session for analyseSession, by player or (numbered) by team. */
export function buildDebriefInput(source: DebriefSource): DebriefInput {
  const itemIds = new Set(source.items.map((i) => i.id));
  const responses = source.responses.filter((r) => itemIds.has(r.itemId));
  const fractional = new Set(responses.filter((r) => r.credit !== 0 && r.credit !== 1).map((r) => r.itemId));
  const items: DebriefItem[] = source.items.map((item) => ({
    id: item.id,
    optionIds: choiceOptions(item).map((o) => o.id),
    correctOptionIds: correctOptionIds(item),
    dichotomous: scoredAllOrNothing(item) && !fractional.has(item.id),
  }));
  const teamRounds = source.teamRounds
    .filter((r) => itemIds.has(r.itemId))
    .map((r) => ({ teamId: r.teamId, itemId: r.itemId, points: r.points, correct: r.correct ?? r.correctShare >= 1, unity: r.unity }));
  const toResponse = (examineeId: string, r: (typeof responses)[number]): DebriefResponse => ({
    examineeId,
    itemId: r.itemId,
    credit: r.credit,
    chosenOptionIds: chosenOptionIds(r.response),
    answered: true,
  });

  if (unitOf(source) === 'team') {
    const seen = new Set<string>();
    const teamResponses: DebriefResponse[] = [];
    for (const r of responses) {
      if (r.teamId === null || seen.has(`${r.teamId}/${r.itemId}`)) continue;
      seen.add(`${r.teamId}/${r.itemId}`);
      teamResponses.push(toResponse(r.teamId, r));
    }
    const teamIds = new Set(source.teams.map((t) => t.id));
    return {
      items,
      examinees: source.teams.map((t) => ({ id: t.id })),
      responses: teamResponses.filter((r) => teamIds.has(r.examineeId)),
      teams: source.teams.map((t) => ({ id: t.id, memberIds: [t.id] })),
      teamRounds: teamRounds.filter((r) => teamIds.has(r.teamId)),
    };
  }

  const players = countedPlayers(source);
  const present = new Set(players.filter((p) => !p.deleted).map((p) => p.id));
  const teamIds = new Set(source.teams.map((t) => t.id));
  return {
    items,
    examinees: players.map((p) => ({ id: p.id, removed: p.deleted })),
    responses: responses.filter((r) => present.has(r.playerId)).map((r) => toResponse(r.playerId, r)),
    teams: source.teams.map((t) => ({ id: t.id, memberIds: players.filter((p) => p.teamId === t.id).map((p) => p.id) })),
    teamRounds: teamRounds.filter((r) => teamIds.has(r.teamId)),
  };
}

const figure = <T>(f: Figure<T>): FigureDto<T> => f as FigureDto<T>;

function mean(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0) / values.length;
}

function classAccuracy(analysis: SessionAnalysis): FigureDto {
  if (analysis.itemCount === 0) return { value: null, reason: NotComputedReason.noItems };
  if (analysis.examinees.length === 0) return { value: null, reason: NotComputedReason.noExaminees };
  return { value: mean(analysis.examinees.map((e) => e.score / analysis.itemCount)), reason: null };
}

function distractorTable(item: SessionItem, analysis: ItemAnalysis): FigureDto<DistractorTableDto> {
  const table = analysis.distractors;
  if (table.value === null) return { value: null, reason: table.reason };
  const options = choiceOptions(item);
  return {
    value: {
      rows: table.value.options.map((row) => {
        const index = options.findIndex((o) => o.id === row.optionId);
        return {
          optionId: row.optionId,
          letter: optionLetter(index),
          text: options[index]?.text ?? '',
          isKey: row.isKey,
          overall: row.overall,
          upper: figure(row.upper),
          lower: figure(row.lower),
          nonFunctional: row.nonFunctional,
          review: row.review,
        };
      }),
      notAnswered: {
        overall: table.value.notAnswered.overall,
        upper: figure(table.value.notAnswered.upper),
        lower: figure(table.value.notAnswered.lower),
      },
    },
    reason: null,
  };
}

/** Whether an item goes on the "to revisit" list: p under REVISIT_BELOW_P (common practice: under 70 %). */
export function needsRevisit(p: Figure): boolean {
  return p.value !== null && p.value < REVISIT_BELOW_P;
}

function itemDto(item: SessionItem, position: number, analysis: ItemAnalysis): DebriefItemDto {
  return {
    id: item.id,
    position,
    prompt: item.prompt,
    type: item.type,
    tags: item.tags,
    answeredCount: analysis.answeredCount,
    p: figure(analysis.difficulty),
    D: figure(analysis.discrimination),
    upperP: figure(analysis.upperP),
    lowerP: figure(analysis.lowerP),
    pointBiserial: figure(analysis.pointBiserial),
    reliabilityIfDeleted: figure(analysis.reliabilityIfDeleted),
    flags: analysis.flags,
    revisit: needsRevisit(analysis.difficulty),
    distractors: distractorTable(item, analysis),
    explanation: item.explanation,
    key: item.key,
    keyText: keyText(item),
  };
}

/** Each unit's own answer per item, to show beside the key. */
function answersByUnit(source: DebriefSource, unit: DebriefUnit): Map<string, ItemResponse | null> {
  const byUnit = new Map<string, ItemResponse | null>();
  for (const r of source.responses) {
    const id = unit === 'team' ? r.teamId : r.playerId;
    if (id !== null && !byUnit.has(`${id}/${r.itemId}`)) byUnit.set(`${id}/${r.itemId}`, r.response);
  }
  return byUnit;
}

function missedItems(source: DebriefSource, result: ExamineeResult, answers: Map<string, ItemResponse | null>): MissedItemDto[] {
  return result.missedItems.map((m) => {
    const position = source.items.findIndex((i) => i.id === m.itemId);
    const item = source.items[position];
    const answer = m.answered ? (answers.get(`${result.examineeId}/${m.itemId}`) ?? null) : null;
    return {
      itemId: m.itemId,
      position,
      prompt: item.prompt,
      credit: m.credit,
      answered: m.answered,
      answer,
      answerText: responseText(item, answer),
      key: item.key,
      keyText: keyText(item),
    };
  });
}

function studentDtos(source: DebriefSource, analysis: SessionAnalysis, unit: DebriefUnit): DebriefStudentDto[] {
  const results = new Map(analysis.examinees.map((e) => [e.examineeId, e]));
  const answers = answersByUnit(source, unit);
  const students = countedPlayers(source).map((p): DebriefStudentDto => {
    const base = { playerId: p.id, nickname: p.nickname, rosterEntryId: p.rosterEntryId, rosterName: p.rosterName, teamId: p.teamId };
    const result = p.deleted ? undefined : results.get(unit === 'team' ? (p.teamId ?? '') : p.id);
    if (!result) {
      const reason = p.deleted ? DATA_DELETED_REASON : NOT_ON_A_TEAM_REASON;
      return { ...base, score: null, percent: { value: null, reason }, answered: 0, missed: [], removed: p.deleted };
    }
    return {
      ...base,
      score: result.score,
      percent: figure(result.percent),
      answered: result.answeredCount,
      missed: missedItems(source, result, answers),
      removed: false,
    };
  });
  const name = (s: DebriefStudentDto) => s.rosterName ?? s.nickname;
  return students.sort((a, b) => Number(a.removed) - Number(b.removed) || name(a).localeCompare(name(b), 'en') || (a.playerId < b.playerId ? -1 : 1));
}

function teamDtos(source: DebriefSource, analysis: SessionAnalysis): DebriefTeamDto[] {
  const names = new Map(source.teams.map((t) => [t.id, t.name]));
  return analysis.teams.map((t) => {
    let accuracy = figure(t.accuracy);
    // solo: a round has no single team answer, so accuracy is the mean share of correct members.
    if (source.session.format === 'solo' && t.roundCount > 0) {
      const shares = source.items.map((item) => source.teamRounds.find((r) => r.teamId === t.teamId && r.itemId === item.id)?.correctShare ?? 0);
      accuracy = { value: mean(shares), reason: null };
    }
    const memberCount = unitOf(source) === 'team' ? source.players.filter((p) => p.teamId === t.teamId && !p.deleted).length : t.memberIds.length;
    return { id: t.teamId, name: names.get(t.teamId) ?? '', points: t.points, accuracy, unityRate: figure(t.unityRate), memberCount };
  });
}

export function summaryDto(source: DebriefSource, analysis: SessionAnalysis): DebriefSummaryDto {
  const { session } = source;
  const players = countedPlayers(source);
  return {
    sessionId: session.id,
    bankId: session.bankId,
    bankTitle: session.bankTitle,
    classId: session.classId,
    className: session.className,
    format: session.format,
    unit: unitOf(source),
    playedAt: (session.startedAt ?? session.createdAt).toISOString(),
    endedAt: session.endedAt?.toISOString() ?? null,
    playerCount: players.filter((p) => !p.deleted).length,
    removedCount: players.filter((p) => p.deleted).length,
    itemCount: analysis.itemCount,
    classAccuracy: classAccuracy(analysis),
    reliability: {
      method: analysis.reliability.method,
      value: figure(analysis.reliability.coefficient),
      sem: figure(analysis.reliability.sem),
      excludedItemIds: analysis.reliability.excludedItemIds,
    },
    revisitCount: analysis.items.filter((i) => needsRevisit(i.difficulty)).length,
  };
}

/** The full debrief of one session, every figure from analyseSession. */
export function buildDebrief(source: DebriefSource): { dto: DebriefDto; analysis: SessionAnalysis } {
  const analysis = analyseSession(buildDebriefInput(source));
  const unit = unitOf(source);
  const dto: DebriefDto = {
    ...summaryDto(source, analysis),
    items: source.items.map((item, position) => itemDto(item, position, analysis.items[position])),
    students: studentDtos(source, analysis, unit),
    teams: teamDtos(source, analysis),
  };
  return { dto, analysis };
}
