import Decimal from 'decimal.js';
import fc from 'fast-check';
import { compareStandings, roundPoints, type StandingKey } from './points';

// Formula under test: DESIGN.md §4 "Points": points = round(1000 · c · (1 − w · t/T)).
// Expected values below are worked by hand from that formula.

describe('roundPoints', () => {
  const T = 30_000;

  it('gives 900 for full credit at 6 s of 30 s with w = 0.5', () => {
    // 1000 · 1 · (1 − 0.5 · 6/30) = 1000 · (1 − 0.1) = 900
    expect(roundPoints({ credit: 1, elapsedMs: 6_000, limitMs: T, speedWeight: 0.5 })).toBe(900);
  });

  it('gives the full 1000 at t = 0 and 1000·(1 − w) at t = T', () => {
    // t = 0: 1000 · (1 − 0) = 1000;  t = T: 1000 · (1 − 0.5) = 500
    expect(roundPoints({ credit: 1, elapsedMs: 0, limitMs: T, speedWeight: 0.5 })).toBe(1000);
    expect(roundPoints({ credit: 1, elapsedMs: T, limitMs: T, speedWeight: 0.5 })).toBe(500);
  });

  it('clamps t to [0, T]', () => {
    // t = 45 s > T → t = 30 s → 500;  t = −2 s → t = 0 → 1000
    expect(roundPoints({ credit: 1, elapsedMs: 45_000, limitMs: T, speedWeight: 0.5 })).toBe(500);
    expect(roundPoints({ credit: 1, elapsedMs: -2_000, limitMs: T, speedWeight: 0.5 })).toBe(1000);
  });

  it('ignores time when the speed weight is 0', () => {
    // w = 0: 1000 · 0.5 · (1 − 0) = 500 whatever t is
    for (const t of [0, 7_000, 29_999, 30_000]) {
      expect(roundPoints({ credit: 0.5, elapsedMs: t, limitMs: T, speedWeight: 0 })).toBe(500);
    }
  });

  it('scales with partial credit', () => {
    // c = 0.5, t = 15 s: 1000 · 0.5 · (1 − 0.5 · 0.5) = 500 · 0.75 = 375
    expect(roundPoints({ credit: 0.5, elapsedMs: 15_000, limitMs: T, speedWeight: 0.5 })).toBe(375);
    // c = 2/3 (two of three correct picks), t = 0: 666.67 → 667
    expect(roundPoints({ credit: 2 / 3, elapsedMs: 0, limitMs: T, speedWeight: 0.5 })).toBe(667);
    // c = 0 → 0
    expect(roundPoints({ credit: 0, elapsedMs: 1_000, limitMs: T, speedWeight: 0.5 })).toBe(0);
  });

  it('gives 0 at t = T with w = 1', () => {
    // 1000 · (1 − 1 · 1) = 0
    expect(roundPoints({ credit: 1, elapsedMs: T, limitMs: T, speedWeight: 1 })).toBe(0);
  });

  it('measures t against the own extended limit', () => {
    // multiplier 1.5: T = 45 s; t = 9 s → 1000 · (1 − 0.5 · 0.2) = 900
    expect(roundPoints({ credit: 1, elapsedMs: 9_000, limitMs: 45_000, speedWeight: 0.5 })).toBe(900);
    // t = 1 s of 30 s: 1000 · (1 − 1/60) = 983.33 → 983
    expect(roundPoints({ credit: 1, elapsedMs: 1_000, limitMs: T, speedWeight: 0.5 })).toBe(983);
  });

  it('rounds exact halves up, as Math.round does for positive numbers', () => {
    // Math.round: "if the fractional portion is exactly 0.5, the argument is rounded to the
    // next integer in the direction of +∞" (MDN, Math.round; ECMA-262 #sec-math.round).
    // c = 0.1, t = 25.5 s: 100 · (1 − 0.5 · 0.85) = 100 · 0.575 = 57.5 → 58
    // (plain binary floats give 57.49999999999999 here, which Math.round alone turns into 57).
    expect(roundPoints({ credit: 0.1, elapsedMs: 25_500, limitMs: T, speedWeight: 0.5 })).toBe(58);
    // c = 1, t = 810 ms of 30 s: 1000 · (1 − 0.5 · 0.027) = 986.5 → 987
    expect(roundPoints({ credit: 1, elapsedMs: 810, limitMs: T, speedWeight: 0.5 })).toBe(987);
    // c = 0.75, t = 1 s: 750 · (1 − 1/60) = 737.5 → 738
    expect(roundPoints({ credit: 0.75, elapsedMs: 1_000, limitMs: T, speedWeight: 0.5 })).toBe(738);
  });

  it('agrees with decimal.js ROUND_HALF_UP on decimal inputs', () => {
    // Reference: decimal.js 10.6 exact decimal arithmetic, ROUND_HALF_UP.
    const twentieths = fc.integer({ min: 0, max: 20 }).map((k) => k / 20);
    fc.assert(
      fc.property(
        twentieths,
        twentieths,
        fc.constantFrom(30_000, 37_500, 45_000, 60_000, 20_000),
        fc.integer({ min: 0, max: 60_000 }),
        (credit, speedWeight, limitMs, elapsedMs) => {
          const t = Math.min(elapsedMs, limitMs);
          // 1000 · c · (T − w·t) / T, dividing last: an early t/T (e.g. 52150/60000) would be cut
          // to 20 digits and turn an exact half such as 78.5 into 78.4999… (a stress run found it).
          const expected = new Decimal(1000)
            .times(credit)
            .times(new Decimal(limitMs).minus(new Decimal(speedWeight).times(t)))
            .div(limitMs)
            .toDecimalPlaces(0, Decimal.ROUND_HALF_UP)
            .toNumber();
          expect(roundPoints({ credit, elapsedMs, limitMs, speedWeight })).toBe(expected);
        },
      ),
      // 600 · (1 − 52150/60000) = 78.5 exactly, which rounds half up to 79.
      { numRuns: 2000, seed: 20240901, examples: [[0.6, 1, 60_000, 52_150]] },
    );
  });

  it('refuses a limit that is not positive', () => {
    expect(() => roundPoints({ credit: 1, elapsedMs: 0, limitMs: 0, speedWeight: 0.5 })).toThrow(RangeError);
    expect(() => roundPoints({ credit: Number.NaN, elapsedMs: 0, limitMs: T, speedWeight: 0.5 })).toThrow(RangeError);
  });
});

describe('compareStandings', () => {
  // Rule: DESIGN.md §4 "Ties in standings break on more correct answers, then lower total
  // response time"; the final id order is ours, for a stable display.
  const entry = (id: string, points: number, correctAnswers: number, responseMs: number): StandingKey => ({
    id,
    points,
    correctAnswers,
    responseMs,
  });
  const order = (entries: StandingKey[]): string[] => [...entries].sort(compareStandings).map((e) => e.id);

  it('puts more points first', () => {
    expect(order([entry('a', 900, 5, 1), entry('b', 1200, 1, 99)])).toEqual(['b', 'a']);
  });

  it('breaks a points tie on more correct answers', () => {
    expect(order([entry('a', 1200, 2, 10), entry('b', 1200, 3, 90)])).toEqual(['b', 'a']);
  });

  it('breaks a points and correct tie on lower total response time', () => {
    expect(order([entry('a', 1200, 3, 55_500), entry('b', 1200, 3, 28_500)])).toEqual(['b', 'a']);
  });

  it('falls back to the id so a full tie has a stable order', () => {
    expect(order([entry('zinc', 1, 1, 1), entry('argon', 1, 1, 1), entry('neon', 1, 1, 1)])).toEqual([
      'argon',
      'neon',
      'zinc',
    ]);
  });
});
