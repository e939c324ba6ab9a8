import seedrandom from 'seedrandom';

/** A source of uniform numbers in [0, 1). */
export type Rng = () => number;

/**
 * Seeded generator (seedrandom's default ARC4 stream).
 *
 * seedrandom repeats a short string seed to fill its key, so 'ab' and 'abab'
 * give the same stream (seedrandom README, "Version notes"). A terminator
 * ('\0', the same one seedrandom appends to non-string seeds) keeps every
 * distinct string seed distinct.
 */
export function createRng(seed: string): Rng {
  const prng = seedrandom(seed + '\0');
  return () => prng();
}

/**
 * Fisher–Yates (Durstenfeld's version): for i = n−1 down to 1 swap item i with
 * item j = ⌊rng()·(i+1)⌋. Returns a new array; the input is left untouched.
 */
export function shuffle<T>(items: readonly T[], rng: Rng): T[] {
  const out = items.slice();
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(rng() * (i + 1));
    const held = out[i];
    out[i] = out[j];
    out[j] = held;
  }
  return out;
}
