import fc from 'fast-check';
import { max, mean, min } from 'simple-statistics';
import { formTeams, scoreTeams } from './form-teams';
import { MIXER_WEIGHTS } from './mixer-model';
import type { MixerInput, MixerMode, MixerResult } from './mixer.types';
import { createRng, shuffle } from './rng';
import {
  fewestTogether, fixedSeeds, makeInput, makePlayer, makePlayers, partitionKey, playerId, playerIndex, sizesOf,
} from './mixer.test-factories';

// jstat 1.9.6 ships no type declarations.
const { jStat } = require('jstat') as { jStat: { chisquare: { cdf: (x: number, dof: number) => number } } };

const MODES: MixerMode[] = ['random', 'mix-tables', 'balanced'];

/** Pearson χ² goodness of fit; p-value from jstat 1.9.6's chi-square distribution. */
function chiSquarePValue(observed: readonly number[], expected: readonly number[]): number {
  const statistic = observed.reduce((s, o, i) => s + (o - expected[i]) ** 2 / expected[i], 0);
  return 1 - jStat.chisquare.cdf(statistic, observed.length - 1);
}

/** counts[player][team]: how often each player landed on each team over the seeds. */
function teamCounts(players: number, teams: number, deal: (seed: string) => string[][], seeds: string[]): number[][] {
  const counts = Array.from({ length: players }, () => new Array<number>(teams).fill(0));
  for (const seed of seeds) {
    deal(seed).forEach((team, t) => team.forEach((id) => counts[playerIndex(id)][t]++));
  }
  return counts;
}

const teamMeans = (result: MixerResult, input: MixerInput): number[] =>
  result.teams.map((team) => mean(team.map((id) => input.players.find((p) => p.id === id)?.priorScore ?? NaN)));

/** Arbitrary inputs of up to 30 players with tables, priors, pairs and one earlier session. */
const inputArb: fc.Arbitrary<MixerInput> = fc
  .record({
    n: fc.integer({ min: 1, max: 30 }),
    teams: fc.integer({ min: 1, max: 10 }),
    tables: fc.integer({ min: 1, max: 8 }),
    priors: fc.array(fc.option(fc.double({ min: 0, max: 1, noNaN: true })), { minLength: 30, maxLength: 30 }),
    pairs: fc.array(fc.tuple(fc.nat(29), fc.nat(29)), { maxLength: 12 }),
    mode: fc.constantFrom(...MODES),
    seed: fc.string(),
  })
  .map(({ n, teams, tables, priors, pairs, mode, seed }) => {
    const players = Array.from({ length: n }, (_, i) =>
      makePlayer(playerId(i), { tableGroup: `t${i % tables}`, priorScore: priors[i] }),
    );
    const ids = players.map((p) => p.id);
    const pairOf = ([a, b]: [number, number]): [string, string] => [ids[a % n], ids[b % n]];
    const lastSession = shuffle(ids, createRng(seed)).reduce<string[][]>(
      (acc, id, i) => (i % 3 === 0 ? [...acc, [id]] : [...acc.slice(0, -1), [...acc[acc.length - 1], id]]),
      [],
    );
    return makeInput({
      players, teamCount: teams, mode, seed,
      keepApart: pairs.slice(0, 6).map(pairOf),
      keepTogether: pairs.slice(6).map(pairOf),
      history: [{ sessionsAgo: 1, teams: lastSession }],
    });
  });

describe('formTeams', () => {
  describe('team count', () => {
    it('uses teamCount, else ⌈n / targetSize⌉, else teams of four, clamped to [1, n]', () => {
      const players = makePlayers(10);
      expect(formTeams(makeInput({ players, teamCount: 3 })).teams).toHaveLength(3);
      expect(formTeams(makeInput({ players, teamCount: 3, targetSize: 5 })).teams).toHaveLength(3);
      expect(formTeams(makeInput({ players, teamCount: undefined, targetSize: 3 })).teams).toHaveLength(4);
      expect(formTeams(makeInput({ players, teamCount: undefined })).teams).toHaveLength(3);
      expect(formTeams(makeInput({ players, teamCount: 25 })).teams).toHaveLength(10);
      expect(formTeams(makeInput({ players, teamCount: undefined, targetSize: 50 })).teams).toHaveLength(1);
    });

    it('returns no teams when nobody is present', () => {
      expect(formTeams(makeInput({ players: [] })).teams).toEqual([]);
    });

    it('rejects a team count or target size that is not a positive integer', () => {
      expect(() => formTeams(makeInput({ teamCount: 0 }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ teamCount: 2.5 }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ teamCount: undefined, targetSize: -1 }))).toThrow(RangeError);
    });
  });

  describe('input checks', () => {
    it('rejects duplicate ids, priors outside [0, 1], bad history and bad budgets', () => {
      const [a] = makePlayers(1);
      expect(() => formTeams(makeInput({ players: [a, a] }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ players: [makePlayer('x', { priorScore: 1.2 })] }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ history: [{ sessionsAgo: 0, teams: [] }] }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ budget: { restarts: 0, swapPasses: 1 } }))).toThrow(RangeError);
      expect(() => formTeams(makeInput({ budget: { restarts: 1, swapPasses: -1 } }))).toThrow(RangeError);
    });
  });

  describe('properties over many seeds', () => {
    it('keeps team sizes within one of each other and places every player exactly once', () => {
      fc.assert(
        fc.property(inputArb, (input) => {
          const { teams } = formTeams(input);
          const sizes = sizesOf(teams);
          expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
          expect(teams).toHaveLength(Math.min(input.teamCount ?? 1, input.players.length));
          expect(teams.flat().sort()).toEqual(input.players.map((p) => p.id).sort());
        }),
      );
    });

    it('honours keep-apart whenever some arrangement does', () => {
      // Plant a valid arrangement first, then forbid only pairs it already separates.
      fc.assert(
        fc.property(
          fc.integer({ min: 2, max: 30 }),
          fc.integer({ min: 2, max: 8 }),
          fc.array(fc.tuple(fc.nat(29), fc.nat(29)), { maxLength: 20 }),
          fc.constantFrom(...MODES),
          fc.string(),
          (n, k, pairs, mode, seed) => {
            const players = makePlayers(n, { tableSize: 4, prior: (i) => (i % 5) / 4 });
            const planted = shuffle(players.map((p) => p.id), createRng(`planted:${seed}`));
            const teamOf = new Map(planted.map((id, pos) => [id, pos % Math.min(k, n)]));
            const keepApart = pairs
              .map(([a, b]): [string, string] => [playerId(a % n), playerId(b % n)])
              .filter(([a, b]) => teamOf.get(a) !== teamOf.get(b));
            const result = formTeams(makeInput({ players, teamCount: k, keepApart, mode, seed }));
            expect(result.cost.keepApartViolations).toBe(0);
          },
        ),
        // A case where every restart's swap search stalled with one pair together (a CI run found it).
        { examples: [[5, 2, [[4, 18], [6, 17], [4, 12], [0, 27]], 'balanced', 'AK']] },
      );
    });

    it('keeps no more keep-apart pairs together than the fewest possible (exhaustive check, up to 8 players)', () => {
      // The search is a heuristic, so this records how close it comes rather than proving it:
      // 0 of 30,000 random cases fell short when it was written; the seed keeps CI to the same cases.
      fc.assert(
        fc.property(
          fc.integer({ min: 2, max: 8 }),
          fc.integer({ min: 2, max: 4 }),
          fc.array(fc.tuple(fc.nat(7), fc.nat(7)), { maxLength: 16 }),
          fc.constantFrom(...MODES),
          fc.string(),
          (n, kRaw, raw, mode, seed) => {
            const k = Math.min(kRaw, n);
            const pairs = raw.map(([a, b]): [number, number] => [a % n, b % n]);
            const keepApart = pairs.map(([a, b]): [string, string] => [playerId(a), playerId(b)]);
            const result = formTeams(makeInput({ players: makePlayers(n, { tableSize: 2 }), teamCount: k, keepApart, mode, seed }));
            expect(result.cost.keepApartViolations).toBe(fewestTogether(n, k, pairs));
          },
        ),
        { numRuns: 500, seed: 20261202 },
      );
    });

    it('puts only one pair together when three students who must be apart share two teams (pigeonhole)', () => {
      const players = makePlayers(30, { tableSize: 4, prior: (i) => (i % 5) / 4 });
      const rng = createRng('plant');
      // Three mutually apart, plus 40 pairs a planted split of the others honours.
      const side = new Map(shuffle(Array.from({ length: 27 }, (_, i) => i + 3), rng).map((p, pos) => [p, pos % 2]));
      const keepApart: [string, string][] = [[playerId(0), playerId(1)], [playerId(0), playerId(2)], [playerId(1), playerId(2)]];
      while (keepApart.length < 43) {
        const [a, b] = [3 + Math.floor(rng() * 27), 3 + Math.floor(rng() * 27)];
        if (side.get(a) !== side.get(b)) keepApart.push([playerId(a), playerId(b)]);
      }
      for (const mode of MODES) {
        for (const seed of fixedSeeds(5, `tri-${mode}`)) {
          expect(formTeams(makeInput({ players, teamCount: 2, keepApart, mode, seed })).cost.keepApartViolations).toBe(1);
        }
      }
    });

    it('gives identical teams for the same seed and inputs, whatever their order', () => {
      fc.assert(
        fc.property(inputArb, fc.string(), (input, reorderSeed) => {
          const rng = createRng(reorderSeed);
          const reordered: MixerInput = {
            ...input,
            players: shuffle(input.players, rng),
            keepApart: shuffle(input.keepApart, rng).map(([a, b]): [string, string] => [b, a]),
            keepTogether: shuffle(input.keepTogether, rng),
            history: input.history.map((h) => ({ ...h, teams: shuffle(h.teams.map((t) => shuffle(t, rng)), rng) })),
          };
          const first = formTeams(input);
          expect(formTeams(input)).toEqual(first);
          expect(formTeams(reordered)).toEqual(first);
        }),
      );
    });

    it('usually gives different teams for different seeds', () => {
      for (const mode of MODES) {
        const players = makePlayers(20, { tableSize: 5, prior: (i) => (i % 7) / 6 });
        const seeds = fixedSeeds(100, `differ-${mode}`);
        const groupings = new Set(
          seeds.map((seed) => partitionKey(formTeams(makeInput({ players, teamCount: 4, mode, seed })).teams)),
        );
        // 20 players into 4 unlabelled teams of 5: 20! / (5!⁴ · 4!) = 488,864,376 groupings,
        // and each mode leaves many of them optimal, so repeats should be rare.
        expect(groupings.size).toBeGreaterThanOrEqual(95);
      }
    });
  });

  describe('random mode', () => {
    const seeds = fixedSeeds(3000, 'chi');
    // Each player's team over independent seeds is a categorical draw, so each row of counts
    // gets a Pearson goodness-of-fit test with teams − 1 degrees of freedom; Bonferroni over
    // the players keeps the family-wise α at 0.001 (common practice).
    const alpha = 0.001;

    it('puts each player on each of 3 equal teams about equally often (χ², 3000 fixed seeds)', () => {
      const players = makePlayers(12);
      const counts = teamCounts(12, 3, (seed) => formTeams(makeInput({ players, teamCount: 3, seed })).teams, seeds);
      const pValues = counts.map((row) => chiSquarePValue(row, [1000, 1000, 1000]));
      expect(Math.min(...pValues)).toBeGreaterThan(alpha / 12);
    });

    it('puts each player on a team in proportion to its size when sizes differ (13 into 3)', () => {
      const players = makePlayers(13);
      const counts = teamCounts(13, 3, (seed) => formTeams(makeInput({ players, teamCount: 3, seed })).teams, seeds);
      const sizes = sizesOf(formTeams(makeInput({ players, teamCount: 3 })).teams);
      expect([...sizes].sort()).toEqual([4, 4, 5]);
      const expected = sizes.map((s) => (3000 * s) / 13);
      const pValues = counts.map((row) => chiSquarePValue(row, expected));
      expect(Math.min(...pValues)).toBeGreaterThan(alpha / 13);
    });

    it('is a check that can fail: the same test rejects the naive any-j swap dealt in blocks', () => {
      // REFERENCES.md §2: the naive swap is biased; dealt in blocks the bias reaches team membership.
      const ids = makePlayers(12).map((p) => p.id);
      const naiveBlocks = (seed: string): string[][] => {
        const rng = createRng(seed);
        const out = ids.slice();
        for (let i = 0; i < out.length; i++) {
          const j = Math.floor(rng() * out.length);
          [out[i], out[j]] = [out[j], out[i]];
        }
        return [out.slice(0, 4), out.slice(4, 8), out.slice(8)];
      };
      const pValues = teamCounts(12, 3, naiveBlocks, seeds).map((row) => chiSquarePValue(row, [1000, 1000, 1000]));
      expect(Math.min(...pValues)).toBeLessThan(alpha / 12);
    });

    it('ignores tables, history and priors but still keeps keep-together pairs together', () => {
      const players = makePlayers(12, { tableSize: 3, prior: (i) => i / 11 });
      const result = formTeams(makeInput({ players, keepTogether: [[playerId(0), playerId(11)]], seed: 'kt' }));
      expect(result.cost.keepTogetherViolations).toBe(0);
      expect(result.cost.total).toBe(0);
    });
  });

  describe('mix-tables mode', () => {
    it('spreads 4 tables of 4 over 4 teams with no same-table pair', () => {
      // Common practice: one player from each table per team is always possible here.
      const players = makePlayers(16, { tableSize: 4 });
      for (const seed of fixedSeeds(30, 'tables')) {
        const result = formTeams(makeInput({ players, teamCount: 4, mode: 'mix-tables', seed }));
        expect(result.cost.sameTablePairs).toBe(0);
      }
      const random = fixedSeeds(30, 'tables').map(
        (seed) => formTeams(makeInput({ players, teamCount: 4, seed })).cost.sameTablePairs,
      );
      expect(mean(random)).toBeGreaterThan(1); // so the zero above is earned, not the default
    });

    it("repeats fewer of last session's pairings than random mode does on average", () => {
      const players = makePlayers(16);
      const ids = players.map((p) => p.id);
      const history = [{ sessionsAgo: 1, teams: [ids.slice(0, 4), ids.slice(4, 8), ids.slice(8, 12), ids.slice(12)] }];
      const repeats = (mode: MixerMode): number[] =>
        fixedSeeds(30, 'history').map(
          (seed) => formTeams(makeInput({ players, teamCount: 4, mode, history, seed })).cost.repeatPairs,
        );
      const randomAverage = mean(repeats('random'));
      expect(mean(repeats('mix-tables'))).toBeLessThan(randomAverage);
      expect(Math.max(...repeats('mix-tables'))).toBe(0);
    });

    it('prefers repeating an older pairing to a recent one (weight 1/sessionsAgo)', () => {
      // 4 players in 2 pairs have 3 groupings; each was used in one earlier session.
      const [a, b, c, d] = makePlayers(4).map((p) => p.id);
      const history = [
        { sessionsAgo: 1, teams: [[a, b], [c, d]] },
        { sessionsAgo: 2, teams: [[a, d], [b, c]] },
        { sessionsAgo: 3, teams: [[a, c], [b, d]] },
      ];
      for (const seed of fixedSeeds(10, 'recency')) {
        const input = makeInput({ players: makePlayers(4), teamCount: 2, mode: 'mix-tables', history, seed });
        const result = formTeams(input);
        expect(partitionKey(result.teams)).toBe(partitionKey([[a, c], [b, d]]));
        expect(result.cost.total).toBeCloseTo(2 / 3, 12);
        expect(result.cost.repeatPairs).toBe(2);
      }
    });
  });

  describe('balanced mode', () => {
    // 16 priors 0, 1/15, …, 1: pairs (i, 15 − i) make every team mean exactly 0.5.
    const players = makePlayers(16, { prior: (i) => i / 15 });

    it('evens out team mean prior scores far better than random mode', () => {
      const seeds = fixedSeeds(20, 'balanced');
      const spread = (mode: MixerMode): number[] =>
        seeds.map((seed) => formTeams(makeInput({ players, teamCount: 4, mode, seed })).cost.performanceSpread);
      const balanced = spread('balanced');
      const random = spread('random');
      expect(max(balanced)).toBeLessThan(min(random));
      expect(max(balanced)).toBeLessThan(0.05);
    });

    it('reports the spread as max − min of team means (checked with simple-statistics mean)', () => {
      for (const mode of MODES) {
        const input = makeInput({ players, teamCount: 4, mode, seed: `spread-${mode}` });
        const result = formTeams(input);
        const means = teamMeans(result, input);
        expect(result.cost.performanceSpread).toBeCloseTo(max(means) - min(means), 12);
      }
    });

    it('lets players without a prior count as the class mean', () => {
      const input = makeInput({
        mode: 'balanced',
        players: [
          makePlayer('hi', { priorScore: 1 }),
          makePlayer('lo', { priorScore: 0 }),
          makePlayer('x'),
          makePlayer('y'),
        ],
      });
      // Class mean 0.5: {hi, lo} and {x, y} both average 0.5; {hi, x} and {lo, y} give 0.75 and 0.25.
      expect(scoreTeams(input, [['hi', 'lo'], ['x', 'y']]).performanceSpread).toBe(0);
      expect(scoreTeams(input, [['hi', 'x'], ['lo', 'y']]).performanceSpread).toBe(0.5);
      expect(partitionKey(formTeams({ ...input, teamCount: 2 }).teams)).toBe(partitionKey([['hi', 'lo'], ['x', 'y']]));
    });
  });

  describe('keep-apart and keep-together', () => {
    it('reports a keep-apart pair it cannot avoid, and breaks no more than it must', () => {
      // Four players who must all be apart cannot fit in three teams: exactly one pair must share
      // (pigeonhole); a careless grouping would break more (1.5 pairs on average at random).
      const players = makePlayers(9);
      const apart = players.slice(0, 4).map((p) => p.id);
      const keepApart = apart.flatMap((x, i) => apart.slice(i + 1).map((y): [string, string] => [x, y]));
      for (const seed of fixedSeeds(20, 'apart')) {
        const result = formTeams(makeInput({ players, teamCount: 3, keepApart, mode: 'mix-tables', seed }));
        expect(result.cost.keepApartViolations).toBe(1);
      }
    });

    it('keeps keep-together pairs together while sizes allow, and reports them otherwise', () => {
      const players = makePlayers(9, { tableSize: 3 });
      const keepTogether: [string, string][] = [[playerId(0), playerId(1)], [playerId(3), playerId(4)]];
      for (const seed of fixedSeeds(10, 'together')) {
        const result = formTeams(makeInput({ players, teamCount: 3, keepTogether, mode: 'mix-tables', seed }));
        expect(result.cost.keepTogetherViolations).toBe(0);
      }
      // Teams of one cannot hold a pair.
      expect(formTeams(makeInput({ players, teamCount: 9, keepTogether })).cost.keepTogetherViolations).toBe(2);
    });

    it('lets keep-apart win when it contradicts keep-together', () => {
      const players = makePlayers(6);
      const [a, b, c] = players.map((p) => p.id);
      const keepTogether: [string, string][] = [[a, b], [b, c]];
      const result = formTeams(makeInput({ players, teamCount: 2, keepTogether, keepApart: [[a, c]] }));
      expect(result.cost.keepApartViolations).toBe(0);
      expect(result.cost.keepTogetherViolations).toBe(1);
    });

    it('ignores pairs naming a player who is not present', () => {
      const result = formTeams(
        makeInput({ keepApart: [[playerId(0), 'absent']], keepTogether: [['absent', playerId(1)]] }),
      );
      expect(result.cost.keepApartViolations + result.cost.keepTogetherViolations).toBe(0);
    });
  });
});

describe('scoreTeams', () => {
  const players = [
    makePlayer('a', { tableGroup: 'T1' }),
    makePlayer('b', { tableGroup: 'T1' }),
    makePlayer('c', { tableGroup: 'T2' }),
    makePlayer('d', { tableGroup: null }),
    makePlayer('e', { tableGroup: null }),
  ];
  const base = makeInput({
    players,
    history: [
      { sessionsAgo: 2, teams: [['a', 'b'], ['c', 'd', 'absent']] },
      { sessionsAgo: 1, teams: [['c', 'd']] },
    ],
    keepApart: [['a', 'b']],
    keepTogether: [['a', 'e']],
  });
  const teams = [['a', 'b'], ['c', 'd', 'e']];

  it('counts same-table, repeat and rule-breaking pairs of a hand-worked grouping', () => {
    // a–b share table T1 (null tables never match), a–b and c–d met before, a–b are to be
    // apart, a–e are to be together.
    expect(scoreTeams(base, teams)).toMatchObject({
      sameTablePairs: 1,
      repeatPairs: 2,
      keepApartViolations: 1,
      keepTogetherViolations: 1,
      performanceSpread: 0,
    });
  });

  it('weighs each earlier meeting by 1/sessionsAgo and leaves soft costs out of random mode', () => {
    const rules = MIXER_WEIGHTS.keepApart + MIXER_WEIGHTS.keepTogether;
    // a–b: 1/2; c–d: 1/2 + 1/1; plus one same-table pair.
    expect(scoreTeams({ ...base, mode: 'mix-tables' }, teams).total).toBe(rules + 1 + 0.5 + 1.5);
    expect(scoreTeams({ ...base, mode: 'random' }, teams).total).toBe(rules);
  });

  it('rejects a team naming an unknown player', () => {
    expect(() => scoreTeams(base, [['a', 'zed']])).toThrow(RangeError);
  });
});
