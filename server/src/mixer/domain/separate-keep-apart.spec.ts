import fc from 'fast-check';
import { buildModel } from './mixer-model';
import { fewestTogether, makeInput, makePlayers, playerId } from './mixer.test-factories';
import { createRng } from './rng';
import { placeWithFewestTogether, separateKeepApart } from './separate-keep-apart';

/** Keep-apart pairs by player index, read back from the model's matrix. */
const pairsOf = (n: number, apart: Uint8Array): [number, number][] => {
  const pairs: [number, number][] = [];
  for (let a = 0; a < n; a++) for (let b = a + 1; b < n; b++) if (apart[a * n + b]) pairs.push([a, b]);
  return pairs;
};

const modelOf = (n: number, pairs: [number, number][]) =>
  buildModel(
    makeInput({ players: makePlayers(n), keepApart: pairs.map(([a, b]): [string, string] => [playerId(a), playerId(b)]) }),
  );

/** Sizes within one and no pair together, checked from scratch. */
function isSeparation(n: number, k: number, pairs: [number, number][], teamOf: Int32Array): boolean {
  const sizes = new Array<number>(k).fill(0);
  for (let i = 0; i < n; i++) {
    if (teamOf[i] < 0 || teamOf[i] >= k) return false;
    sizes[teamOf[i]]++;
  }
  return Math.max(...sizes) - Math.min(...sizes) <= 1 && pairs.every(([a, b]) => teamOf[a] !== teamOf[b]);
}

describe('separateKeepApart', () => {
  it('separates the pairs a swap search can stall on (found by the formTeams property)', () => {
    // 5 players into teams of 3 and 2; p02 must be apart from p00, p01 and p04, p04 from p03:
    // the only separation is {p02, p03} / {p00, p01, p04}.
    const pairs: [number, number][] = [[4, 3], [1, 2], [4, 2], [0, 2]];
    const teamOf = separateKeepApart(modelOf(5, pairs), 2, createRng('AK'));
    expect(teamOf).not.toBeNull();
    const t = teamOf as Int32Array;
    expect(t[2]).toBe(t[3]);
    expect(new Set([t[0], t[1], t[4]]).size).toBe(1);
    expect(t[0]).not.toBe(t[2]);
  });

  it('returns null when k + 1 players are all to be kept apart (pigeonhole principle)', () => {
    const pairs: [number, number][] = [];
    for (let a = 0; a < 5; a++) for (let b = a + 1; b < 5; b++) pairs.push([a, b]);
    expect(separateKeepApart(modelOf(12, pairs), 4, createRng('clique'))).toBeNull();
  });

  it('returns null when the sizes rule forbids the only colouring', () => {
    // One player apart from the five others fits 2 teams only alone, but 6 players
    // into 2 teams must be 3 and 3.
    const star: [number, number][] = [1, 2, 3, 4, 5].map((b) => [0, b]);
    expect(separateKeepApart(modelOf(6, star), 2, createRng('star'))).toBeNull();
    // Into 5 teams (sizes 2, 1, 1, 1, 1) player 0 can be alone.
    const teamOf = separateKeepApart(modelOf(6, star), 5, createRng('star'));
    expect(teamOf && isSeparation(6, 5, star, teamOf)).toBe(true);
  });

  it('gives up, returning null, when the work budget runs out', () => {
    // Solvable (two pairs into 3 teams), so only the budget can make it fail.
    const pairs: [number, number][] = [[0, 1], [2, 3]];
    expect(separateKeepApart(modelOf(12, pairs), 3, createRng('budget'), 1)).toBeNull();
    const teamOf = separateKeepApart(modelOf(12, pairs), 3, createRng('budget'));
    expect(teamOf && isSeparation(12, 3, pairs, teamOf)).toBe(true);
  });

  it('refuses at once a player kept apart from too many to fill any team', () => {
    // 300 players in teams of 4; player 0 is kept apart from everyone else, so no team can hold them.
    const star: [number, number][] = Array.from({ length: 299 }, (_, i) => [0, i + 1]);
    expect(separateKeepApart(modelOf(300, star), 75, createRng('star'))).toBeNull();
  });

  it('finds a separation exactly when one exists (exhaustive check, up to 8 players)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }),
        fc.integer({ min: 1, max: 4 }),
        fc.array(fc.tuple(fc.nat(7), fc.nat(7)), { maxLength: 14 }),
        fc.string(),
        (n, kRaw, rawPairs, seed) => {
          const k = Math.min(kRaw, n);
          const model = modelOf(n, rawPairs.map(([a, b]) => [a % n, b % n]));
          const pairs = pairsOf(n, model.apart);
          const teamOf = separateKeepApart(model, k, createRng(seed));
          if (teamOf === null) expect(fewestTogether(n, k, pairs)).toBeGreaterThan(0);
          else expect(isSeparation(n, k, pairs, teamOf)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('without a separation, the greedy pass keeps sizes within one and puts one pair of k + 1 together', () => {
    // Five students all to be kept apart, four teams: the pigeonhole principle forces one pair.
    const pairs: [number, number][] = [];
    for (let a = 0; a < 5; a++) for (let b = a + 1; b < 5; b++) pairs.push([a, b]);
    const model = modelOf(14, pairs);
    const teamOf = placeWithFewestTogether(model, 4, createRng('five'));
    const sizes = [0, 1, 2, 3].map((t) => teamOf.filter((x) => x === t).length);
    expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
    expect(pairs.filter(([a, b]) => teamOf[a] === teamOf[b])).toHaveLength(1);
  });

  it('is deterministic for a seed and varies with it', () => {
    const pairs: [number, number][] = [[0, 1], [2, 3], [4, 5]];
    const model = modelOf(12, pairs);
    const first = separateKeepApart(model, 3, createRng('same'));
    expect(separateKeepApart(model, 3, createRng('same'))).toEqual(first);
    const others = ['a', 'b', 'c', 'd', 'e', 'f'].map((s) => Array.from(separateKeepApart(model, 3, createRng(s)) ?? []).join());
    expect(new Set(others).size).toBeGreaterThan(1);
  });
});
