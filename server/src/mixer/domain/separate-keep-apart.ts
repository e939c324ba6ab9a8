import type { MixerModel } from './mixer-model';
import { shuffle, type Rng } from './rng';

/**
 * Work allowed before giving up, counted in partner look-ups (the inner loop of every
 * step). A class with a handful of pairs needs a few thousand. The search runs on the
 * event loop that serves every live session, so the budget bounds what an impossible or
 * tangled request costs: 300 players with 410 pairs that cannot all be honoured gave up
 * after ≈ 17 ms on the dev machine (45 ms on a cold first call).
 */
export const KEEP_APART_WORK_BUDGET = 500_000;

/**
 * Looks for teams with no keep-apart pair together, sizes differing by at most one.
 *
 * The swap search can stall with a pair still together even when a separation
 * exists (a single swap may not lower the count while two would), so formTeams
 * asks this exact search when its restarts leave a violation. It is graph
 * colouring with team capacities: players with a keep-apart partner are placed
 * one by one, the one with the most teams already ruled out first (DSatur,
 * Brélaz 1979), backtracking on a dead end; an empty team is only ever tried
 * once per step, since teams have no identity yet. Everyone else fills the
 * remaining places in shuffled order.
 *
 * Returns each player's team, or null when no separation exists or the budget ran out.
 * A player kept apart from so many that too few are left to fill their team is
 * refused at once, before any search.
 */
export function separateKeepApart(
  model: MixerModel,
  k: number,
  rng: Rng,
  workBudget = KEEP_APART_WORK_BUDGET,
): Int32Array | null {
  const { n } = model;
  const { partners, rank, constrained } = keepApartGraph(model, rng);

  const seats = new TeamSeats(n, k);
  // Every team has at least `base` members, so each player needs base − 1 teammates they may be with.
  if (constrained.some((v) => n - 1 - partners[v].length < seats.base - 1)) return null;
  const { teamOf } = seats;
  let usedTeams = 0;
  let work = 0;

  // Teams counted for the current player carry its stamp, so no set is built per call.
  const seenStamp = new Int32Array(k);
  let stamp = 0;
  const ruledOut = (v: number): number => {
    stamp++;
    work += partners[v].length + 1;
    let count = 0;
    for (const p of partners[v]) {
      const t = teamOf[p];
      if (t >= 0 && seenStamp[t] !== stamp) {
        seenStamp[t] = stamp;
        count++;
      }
    }
    return count;
  };

  const next = (): number => {
    let pick = -1;
    let pickSaturation = -1;
    for (const v of constrained) {
      if (teamOf[v] >= 0) continue;
      const saturation = ruledOut(v);
      if (
        saturation > pickSaturation ||
        (saturation === pickSaturation &&
          (partners[v].length > partners[pick].length ||
            (partners[v].length === partners[pick].length && rank[v] < rank[pick])))
      ) {
        pick = v;
        pickSaturation = saturation;
      }
    }
    return pick;
  };

  const search = (placed: number): boolean => {
    if (placed === constrained.length) return true;
    if (work > workBudget) return false;
    const v = next();
    const limit = Math.min(usedTeams + 1, k);
    for (let t = 0; t < limit; t++) {
      if (!seats.fits(t)) continue;
      work += partners[v].length;
      if (partners[v].some((p) => teamOf[p] === t)) continue;
      const wasUsed = usedTeams;
      seats.seat(v, t);
      if (t === usedTeams) usedTeams++;
      if (search(placed + 1)) return true;
      seats.unseat(v, t);
      usedTeams = wasUsed;
      if (work > workBudget) return false;
    }
    return false;
  };

  if (!search(0)) return null;
  seats.fillRest(rng);
  return teamOf;
}

/**
 * When no separation exists: one greedy pass in the same order (most teams ruled out
 * first), each player going to the open team with the fewest of their keep-apart
 * partners, so as few pairs as the pass can manage end up together (the swap search
 * then lowers it further). Always gives teams whose sizes differ by at most one.
 */
export function placeWithFewestTogether(model: MixerModel, k: number, rng: Rng): Int32Array {
  const { partners, rank, constrained } = keepApartGraph(model, rng);
  const seats = new TeamSeats(model.n, k);
  const { teamOf, size } = seats;
  const together = new Int32Array(k);
  const order = [...constrained].sort((a, b) => partners[b].length - partners[a].length || rank[a] - rank[b]);
  for (const v of order) {
    together.fill(0);
    for (const p of partners[v]) if (teamOf[p] >= 0) together[teamOf[p]]++;
    let pick = -1;
    for (let t = 0; t < k; t++) {
      if (!seats.fits(t)) continue;
      if (pick < 0 || together[t] < together[pick] || (together[t] === together[pick] && size[t] < size[pick])) pick = t;
    }
    seats.seat(v, pick);
  }
  seats.fillRest(rng);
  return teamOf;
}

/** Each player's keep-apart partners, a seeded tie-breaking rank, and who has any partner. */
function keepApartGraph(model: MixerModel, rng: Rng): { partners: number[][]; rank: Int32Array; constrained: number[] } {
  const { n, apart } = model;
  const partners: number[][] = Array.from({ length: n }, () => []);
  for (let a = 0; a < n; a++) {
    for (let b = 0; b < n; b++) if (a !== b && apart[a * n + b]) partners[a].push(b);
  }
  // A seeded rank breaks ties, so different seeds find different arrangements.
  const rank = new Int32Array(n);
  shuffle(Array.from({ length: n }, (_, i) => i), rng).forEach((player, r) => (rank[player] = r));
  const constrained = Array.from({ length: n }, (_, i) => i).filter((i) => partners[i].length > 0);
  return { partners, rank, constrained };
}

/**
 * Each player's team (−1 while unplaced) and the teams' sizes, under the sizes rule: every
 * team holds ⌊n/k⌋, and n mod k of them one more.
 */
class TeamSeats {
  readonly teamOf: Int32Array;
  readonly size: Int32Array;
  readonly base: number;
  private readonly bigAllowed: number;
  private bigTeams = 0;

  constructor(n: number, private readonly k: number) {
    this.teamOf = new Int32Array(n).fill(-1);
    this.size = new Int32Array(k);
    this.base = Math.floor(n / k);
    this.bigAllowed = n % k;
  }

  fits(t: number): boolean {
    return this.size[t] < this.base || (this.size[t] === this.base && this.bigTeams < this.bigAllowed);
  }

  seat(v: number, t: number): void {
    this.teamOf[v] = t;
    if (this.size[t] === this.base) this.bigTeams++;
    this.size[t]++;
  }

  unseat(v: number, t: number): void {
    this.teamOf[v] = -1;
    this.size[t]--;
    if (this.size[t] === this.base) this.bigTeams--;
  }

  /** Players not yet placed (no keep-apart partner) take the free places, in shuffled order. */
  fillRest(rng: Rng): void {
    const rest = shuffle(
      Array.from({ length: this.teamOf.length }, (_, i) => i).filter((i) => this.teamOf[i] < 0),
      rng,
    );
    let t = 0;
    for (const v of rest) {
      while (!this.fits(t)) t = (t + 1) % this.k;
      this.seat(v, t);
      t = (t + 1) % this.k;
    }
  }
}
