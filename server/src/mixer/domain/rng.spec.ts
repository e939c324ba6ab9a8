import seedrandom from 'seedrandom';
import { shuffle as referenceShuffle } from 'simple-statistics';
import fc from 'fast-check';
import { createRng, shuffle, type Rng } from './rng';

/** An rng that replays fixed values and fails loudly if asked for more. */
function scriptedRng(values: readonly number[]): Rng & { calls: () => number } {
  let next = 0;
  const rng = (): number => {
    if (next >= values.length) throw new Error('rng asked for more numbers than scripted');
    return values[next++];
  };
  return Object.assign(rng, { calls: () => next });
}

/** Every sequence of choices j_i ∈ [0, i] for i = n−1..1, as the mid-point numbers that pick them. */
function allFisherYatesPaths(n: number): number[][] {
  let paths: number[][] = [[]];
  for (let i = n - 1; i >= 1; i--) {
    paths = paths.flatMap((p) => Array.from({ length: i + 1 }, (_, j) => [...p, (j + 0.5) / (i + 1)]));
  }
  return paths;
}

describe('createRng', () => {
  // seedrandom itself, as a guard that the dependency is the documented ARC4 stream.
  it('relies on seedrandom 3.0.5 producing its documented first doubles', () => {
    // davidbau/seedrandom README (v3.0.5): seedrandom('hello.') → 0.9282578795792454, 0.3752569768646784.
    const rng = seedrandom('hello.');
    expect(rng()).toBe(0.9282578795792454);
    expect(rng()).toBe(0.3752569768646784);
    // README 3.0.5: then .quick() → 0.7316977467853576, .int32() → 1966374204.
    expect(rng.quick()).toBe(0.7316977467853576);
    expect(rng.int32()).toBe(1966374204);
  });

  it('appends the same terminator seedrandom gives a numeric seed', () => {
    // seedrandom test/prngtest.js: seedrandom(1).double() = 0.1776348083296759, and the README says a
    // non-string seed gets '\0' appended, so createRng('1') must be that stream.
    const rng = createRng('1');
    expect(rng()).toBe(0.1776348083296759);
    const reference = seedrandom(1 as unknown as string);
    const ours = createRng('1');
    for (let i = 0; i < 100; i++) expect(ours()).toBe(reference());
  });

  it("keeps 'ab' and 'abab' apart although plain seedrandom treats them alike", () => {
    // README "Version notes": seedrandom('ab') is equivalent to seedrandom('abab').
    expect(seedrandom('ab')()).toBe(seedrandom('abab')());
    expect(createRng('ab')()).not.toBe(createRng('abab')());
  });

  it('replays the same stream for the same seed and returns numbers in [0, 1)', () => {
    fc.assert(
      fc.property(fc.string(), (seed) => {
        const a = createRng(seed);
        const b = createRng(seed);
        for (let i = 0; i < 20; i++) {
          const x = a();
          expect(x).toBe(b());
          expect(x >= 0 && x < 1).toBe(true);
        }
      }),
    );
  });
});

describe('shuffle', () => {
  it("gives 8,7,3,5,9,1,2,6,4,10 for [1..10] with seedrandom('hello.')", () => {
    // REFERENCES.md §2 [C]; simple-statistics 7.12.1 shuffle(arr, rng) is the independent reference.
    const input = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expect(shuffle(input, seedrandom('hello.'))).toEqual([8, 7, 3, 5, 9, 1, 2, 6, 4, 10]);
    expect(referenceShuffle(input, seedrandom('hello.'))).toEqual([8, 7, 3, 5, 9, 1, 2, 6, 4, 10]);
  });

  it('agrees with simple-statistics shuffle for any array and seed', () => {
    // simple-statistics 7.12.1 shuffle: Fisher–Yates with an injectable random source.
    fc.assert(
      fc.property(fc.array(fc.integer()), fc.string(), (items, seed) => {
        expect(shuffle(items, createRng(seed))).toEqual(referenceShuffle(items, createRng(seed)));
      }),
    );
  });

  it('returns a permutation and leaves the input untouched', () => {
    fc.assert(
      fc.property(fc.array(fc.integer()), fc.string(), (items, seed) => {
        const before = items.slice();
        const out = shuffle(items, createRng(seed));
        expect(items).toEqual(before);
        expect(out).not.toBe(items);
        expect([...out].sort((a, b) => a - b)).toEqual([...items].sort((a, b) => a - b));
      }),
    );
  });

  it('draws j = ⌊rng()·(i+1)⌋ for i = n−1 down to 1, one number per step', () => {
    // Durstenfeld (1964) CACM 7(7):420, from memory: n−1 draws, the last position first.
    const rng = scriptedRng([0, 0.99, 0.5]);
    // i=3: j=0 → [d,b,c,a]; i=2: j=⌊0.99·3⌋=2 → unchanged; i=1: j=⌊0.5·2⌋=1 → unchanged.
    expect(shuffle(['a', 'b', 'c', 'd'], rng)).toEqual(['d', 'b', 'c', 'a']);
    expect(rng.calls()).toBe(3);
  });

  it('gives each of the 6 orders of 3 items on exactly one of the 3·2 rng paths', () => {
    // Exact uniformity of Algorithm P, Knuth TAOCP Vol. 2 §3.4.2 (from memory); REFERENCES.md §2 [C].
    const counts = new Map<string, number>();
    for (const path of allFisherYatesPaths(3)) {
      const key = shuffle([1, 2, 3], scriptedRng(path)).join('');
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    expect(Object.fromEntries(counts)).toEqual({ '123': 1, '132': 1, '213': 1, '231': 1, '312': 1, '321': 1 });
  });

  it('is a check that can fail: the same enumeration exposes the naive any-j swap', () => {
    // REFERENCES.md §2 bias detector [C]: 27 paths → 123:4, 132:5, 213:5, 231:5, 312:4, 321:4.
    const naive = (items: number[], rng: Rng): number[] => {
      const out = items.slice();
      for (let i = 0; i < out.length; i++) {
        const j = Math.floor(rng() * out.length);
        [out[i], out[j]] = [out[j], out[i]];
      }
      return out;
    };
    const counts = new Map<string, number>();
    for (let path = 0; path < 27; path++) {
      const digits = [Math.floor(path / 9), Math.floor(path / 3) % 3, path % 3];
      const key = naive([1, 2, 3], scriptedRng(digits.map((d) => (d + 0.5) / 3))).join('');
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    expect(Object.fromEntries(counts)).toEqual({ '123': 4, '132': 5, '213': 5, '231': 5, '312': 4, '321': 4 });
  });
});
