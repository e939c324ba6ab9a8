import { DebriefInput, DebriefInputError, DebriefTeam, DebriefTeamRound } from './debrief-input';
import { Figure, NotComputedReason, computed, notComputed } from './figure';

export interface TeamResult {
  teamId: string;
  /** Members still present (removed examinees are left out). */
  memberIds: string[];
  points: number;
  /** Every item played counts as a round; a team with no row for it scored nothing. */
  roundCount: number;
  correctRounds: number;
  unityRounds: number;
  /** Share (0..1) of rounds answered correctly. */
  accuracy: Figure;
  /** Share (0..1) of rounds where every member chose the correct answer. */
  unityRate: Figure;
}

function assertMembersKnown(teams: readonly DebriefTeam[], input: DebriefInput): void {
  const examineeIds = new Set(input.examinees.map((examinee) => examinee.id));
  for (const team of teams) {
    const unknown = team.memberIds.find((id) => !examineeIds.has(id));
    if (unknown !== undefined) throw new DebriefInputError(`team "${team.id}": unknown member "${unknown}"`);
  }
}

/** Validated rounds grouped by team. */
function roundsByTeam(teams: readonly DebriefTeam[], input: DebriefInput): Map<string, DebriefTeamRound[]> {
  const itemIds = new Set(input.items.map((item) => item.id));
  const byTeam = new Map(teams.map((team) => [team.id, [] as DebriefTeamRound[]]));
  if (byTeam.size !== teams.length) throw new DebriefInputError('duplicate team id');
  for (const round of input.teamRounds ?? []) {
    const where = `round of team "${round.teamId}" on "${round.itemId}"`;
    const rounds = byTeam.get(round.teamId);
    if (!rounds) throw new DebriefInputError(`${where}: unknown team`);
    if (!itemIds.has(round.itemId)) throw new DebriefInputError(`${where}: unknown item`);
    if (!Number.isFinite(round.points)) throw new DebriefInputError(`${where}: points are not a number`);
    if (rounds.some((other) => other.itemId === round.itemId)) throw new DebriefInputError(`duplicate ${where}`);
    rounds.push(round);
  }
  return byTeam;
}

/**
 * Team figures come from the rounds as the game scored them; a removed member's past
 * votes are already inside those points and cannot be taken out here.
 */
export function teamResults(input: DebriefInput, presentIds: ReadonlySet<string>): TeamResult[] {
  const teams = input.teams ?? [];
  assertMembersKnown(teams, input);
  const byTeam = roundsByTeam(teams, input);
  const roundCount = input.items.length;
  const share = (count: number): Figure =>
    roundCount === 0 ? notComputed(NotComputedReason.noItems) : computed(count / roundCount);

  return teams.map((team) => {
    const rounds = byTeam.get(team.id) ?? [];
    const correctRounds = rounds.filter((round) => round.correct).length;
    const unityRounds = rounds.filter((round) => round.unity).length;
    return {
      teamId: team.id,
      memberIds: team.memberIds.filter((id) => presentIds.has(id)),
      points: rounds.reduce((acc, round) => acc + round.points, 0),
      roundCount,
      correctRounds,
      unityRounds,
      accuracy: share(correctRounds),
      unityRate: share(unityRounds),
    };
  });
}
