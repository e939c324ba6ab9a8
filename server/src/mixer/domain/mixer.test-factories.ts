/** Test data for the Mixer specs, in one place. */
import type { MixerInput, MixerPlayer } from './mixer.types';

/** 'p00', 'p01', …: sortable ids so a player's index is easy to read back. */
export const playerId = (i: number): string => `p${String(i).padStart(2, '0')}`;

export const playerIndex = (id: string): number => Number(id.slice(1));

export function makePlayer(id: string, overrides: Partial<Omit<MixerPlayer, 'id'>> = {}): MixerPlayer {
  return { id, tableGroup: null, priorScore: null, ...overrides };
}

export interface PlayersOptions {
  /** Player i sits at table ⌊i / tableSize⌋. */
  tableSize?: number;
  prior?: (i: number) => number | null;
}

export function makePlayers(count: number, options: PlayersOptions = {}): MixerPlayer[] {
  return Array.from({ length: count }, (_, i) =>
    makePlayer(playerId(i), {
      tableGroup: options.tableSize ? `table-${Math.floor(i / options.tableSize)}` : null,
      priorScore: options.prior ? options.prior(i) : null,
    }),
  );
}

export function makeInput(overrides: Partial<MixerInput> = {}): MixerInput {
  return {
    players: makePlayers(12),
    teamCount: 3,
    keepApart: [],
    keepTogether: [],
    history: [],
    mode: 'random',
    seed: 'test-seed',
    ...overrides,
  };
}

/** A fixed list of seeds, so statistical checks give the same verdict every run. */
export const fixedSeeds = (count: number, prefix = 'seed'): string[] =>
  Array.from({ length: count }, (_, i) => `${prefix}-${i}`);

/** Teams as a label-free string: the same grouping with teams in another order compares equal. */
export const partitionKey = (teams: readonly (readonly string[])[]): string =>
  teams
    .map((t) => [...t].sort().join(','))
    .sort()
    .join(' | ');

export const sizesOf = (teams: readonly (readonly string[])[]): number[] => teams.map((t) => t.length);

/**
 * Exhaustive oracle: the fewest keep-apart pairs together over every assignment of n players
 * to k teams with sizes within one (kⁿ assignments, so only for small n). Independent of the
 * Mixer's search; 0 means a separation exists.
 */
export function fewestTogether(n: number, k: number, pairs: readonly [number, number][]): number {
  const distinct = new Map<string, [number, number]>();
  for (const [a, b] of pairs) if (a !== b) distinct.set(a < b ? `${a},${b}` : `${b},${a}`, [a, b]);
  const teamOf = new Int32Array(n);
  let best = Infinity;
  for (let code = 0; code < k ** n; code++) {
    let c = code;
    const sizes = new Array<number>(k).fill(0);
    for (let i = 0; i < n; i++) {
      teamOf[i] = c % k;
      c = Math.floor(c / k);
      sizes[teamOf[i]]++;
    }
    if (Math.max(...sizes) - Math.min(...sizes) > 1) continue;
    let together = 0;
    for (const [a, b] of distinct.values()) if (teamOf[a] === teamOf[b]) together++;
    if (together < best) best = together;
  }
  return best;
}
