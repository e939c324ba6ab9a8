import type { MixerPlayer } from './mixer.types';

/**
 * Index of the team a late joiner goes to: the smallest team, then the one with
 * fewest of the newcomer's table-mates, then the lowest index. Members missing
 * from playersById count as strangers.
 */
export function placeLateJoiner(
  teams: readonly (readonly string[])[],
  player: MixerPlayer,
  playersById: ReadonlyMap<string, MixerPlayer>,
): number {
  if (teams.length === 0) throw new RangeError('there is no team to join');
  const tableMates = (team: readonly string[]): number =>
    player.tableGroup === null
      ? 0
      : team.filter((id) => id !== player.id && playersById.get(id)?.tableGroup === player.tableGroup).length;

  let best = 0;
  for (let t = 1; t < teams.length; t++) {
    const sizeDiff = teams[t].length - teams[best].length;
    if (sizeDiff < 0 || (sizeDiff === 0 && tableMates(teams[t]) < tableMates(teams[best]))) best = t;
  }
  return best;
}
