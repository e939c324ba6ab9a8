import fc from 'fast-check';
import { checkAnswer } from './check-answer';
import { countDiscordantPairs, orderCredit } from './check-order';
import { orderItem } from './answer-check.factories';

/** The definition, transcribed: pairs {i, j} whose relative order differs between the two lists. */
function bruteForceKendallDistance(a: readonly string[], b: readonly string[]): number {
  let count = 0;
  for (let x = 0; x < a.length; x += 1) {
    for (let y = x + 1; y < a.length; y += 1) {
      const i = a[x];
      const j = a[y];
      if ((a.indexOf(i) - a.indexOf(j)) * (b.indexOf(i) - b.indexOf(j)) < 0) count += 1;
    }
  }
  return count;
}

const IDS = ['s1', 's2', 's3', 's4', 's5', 's6', 's7', 's8'];
/** Two random orderings of the same n steps, n in 1..8. */
const twoOrderings = fc
  .integer({ min: 1, max: 8 })
  .chain((n) =>
    fc.tuple(
      fc.shuffledSubarray(IDS.slice(0, n), { minLength: n, maxLength: n }),
      fc.shuffledSubarray(IDS.slice(0, n), { minLength: n, maxLength: n }),
    ),
  );

describe('countDiscordantPairs', () => {
  // Wikipedia "Kendall tau distance", Example: five people ranked by height 1 2 3 4 5 and by
  // weight 3 4 1 2 5 → distance 4, normalised 0.4 (read in a mirror of the article).
  it('finds 4 discordant pairs in the height/weight example', () => {
    const byHeight = ['A', 'B', 'C', 'D', 'E'];
    const byWeight = ['C', 'D', 'A', 'B', 'E']; // weight ranks A3 B4 C1 D2 E5, listed in rank order
    expect(countDiscordantPairs(byHeight, byWeight)).toBe(4);
    expect(1 - orderCredit(byHeight, byWeight)).toBeCloseTo(0.4, 12);
  });

  // Same article, "Kendall tau distance in rankings": 0 3 1 6 2 5 4 vs 1 0 3 6 4 2 5 → 4
  // (pairs 0-1, 3-1, 2-4, 5-4).
  it('finds 4 discordant pairs in the seven-element rankings example', () => {
    expect(countDiscordantPairs('0316254'.split(''), '1036425'.split(''))).toBe(4);
  });

  // Same article: n(n−1)/2 when one list is the reverse of the other.
  it('reaches n(n−1)/2 for a reversed list', () => {
    for (let n = 1; n <= 8; n += 1) {
      const ids = IDS.slice(0, n);
      expect(countDiscordantPairs(ids, [...ids].reverse())).toBe((n * (n - 1)) / 2);
    }
  });

  it('agrees with a brute-force count from the definition on random permutations', () => {
    fc.assert(
      fc.property(twoOrderings, ([a, b]) => {
        expect(countDiscordantPairs(a, b)).toBe(bruteForceKendallDistance(a, b));
      }),
      { numRuns: 500 },
    );
  });

  // Wikipedia: the distance is a metric, so it is symmetric.
  it('is symmetric', () => {
    fc.assert(fc.property(twoOrderings, ([a, b]) => countDiscordantPairs(a, b) === countDiscordantPairs(b, a)));
  });
});

describe('checkAnswer (order)', () => {
  const item = orderItem(['o1', 'o2', 'o3', 'o4', 'o5']);
  const answer = (...sequence: string[]) => checkAnswer(item, { type: 'order', sequence });

  // DESIGN.md §5: credit = 1 − discordant pairs / all pairs.
  it('gives 1 for the key order and 0 for the reversed order', () => {
    expect(answer('o1', 'o2', 'o3', 'o4', 'o5')).toEqual({ credit: 1, correct: true, detail: 'exact' });
    expect(answer('o5', 'o4', 'o3', 'o2', 'o1')).toEqual({ credit: 0, correct: false, detail: 'wrong' });
  });

  it('gives 1 − 1/10 for one adjacent swap of five steps', () => {
    const result = answer('o2', 'o1', 'o3', 'o4', 'o5');
    expect(result.credit).toBeCloseTo(0.9, 12);
    expect(result.detail).toBe('partial');
  });

  it('gives 0 unparseable for a response that is not a permutation of the steps', () => {
    expect(answer('o1', 'o2', 'o3', 'o4')).toEqual({ credit: 0, correct: false, detail: 'unparseable' });
    expect(answer('o1', 'o1', 'o3', 'o4', 'o5').detail).toBe('unparseable');
    expect(answer('o1', 'o2', 'o3', 'o4', 'x9').detail).toBe('unparseable');
    expect(answer('o1', 'o2', 'o3', 'o4', 'o5', 'o5').detail).toBe('unparseable');
  });
});
