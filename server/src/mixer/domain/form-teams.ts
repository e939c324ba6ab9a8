import { buildModel, evaluate, MIXER_WEIGHTS, resolveTeamCount, type MixerModel } from './mixer-model';
import type { CostBreakdown, MixerBudget, MixerInput, MixerResult } from './mixer.types';
import { createRng, shuffle, type Rng } from './rng';
import { placeWithFewestTogether, separateKeepApart } from './separate-keep-apart';

/**
 * 300 players into 75 teams (balanced, the slowest mode): a restart converges in
 * about 3 passes; 4 restarts took ≈ 40 ms warm and ≈ 120 ms on a cold first call
 * on the dev machine, well inside 200 ms.
 */
export const DEFAULT_MIXER_BUDGET: MixerBudget = { restarts: 4, swapPasses: 10 };

/** Deltas smaller than this are float noise, not improvements. */
const EPS = 1e-9;

/**
 * Forms teams whose sizes differ by at most one.
 *
 * Players are sorted by id first, so the teams depend on the seed and the
 * content of the input only, never on its order. Each restart deals a seeded
 * shuffle round-robin into teams, then swaps players of different teams while a
 * swap lowers the cost (first improvement, scanning in the shuffled order).
 * The lowest cost wins; an earlier restart wins ties. When a keep-apart pair is
 * still together, an exact search for a separation (separateKeepApart) gives one
 * more start. In `random` mode only
 * keep-apart and keep-together count, so with neither the first deal stands and
 * every arrangement is equally likely.
 */
export function formTeams(input: MixerInput): MixerResult {
  const budget = checkBudget(input.budget ?? DEFAULT_MIXER_BUDGET);
  const model = buildModel(input);
  const k = resolveTeamCount(model.n, input.teamCount, input.targetSize);
  if (k === 0) return { teams: [], cost: evaluate(model, []), seed: input.seed };

  const rng = createRng(input.seed);
  let best: { teams: number[][]; cost: CostBreakdown } | null = null;
  for (let r = 0; r < budget.restarts; r++) {
    const teams = improve(model, deal(model.n, k, rng), budget.swapPasses);
    const cost = evaluate(model, teams);
    if (best === null || cost.total < best.cost.total - EPS) best = { teams, cost };
    if (best.cost.total <= EPS) break; // nothing can beat zero
  }
  let winner = best as { teams: number[][]; cost: CostBreakdown };
  if (winner.cost.keepApartViolations > 0) {
    // Swaps can stall with a pair together when a separation exists (DESIGN.md §4: never then);
    // when none exists, a greedy start that keeps as few pairs together as it can.
    const start = separateKeepApart(model, k, rng) ?? placeWithFewestTogether(model, k, rng);
    const teams = improve(model, stateOf(start, k, rng), budget.swapPasses);
    const cost = evaluate(model, teams);
    if (cost.total < winner.cost.total - EPS) winner = { teams, cost };
  }
  return { teams: toIds(model, winner.teams), cost: winner.cost, seed: input.seed };
}

/** The breakdown of any teams (e.g. after the teacher moves someone by hand). */
export function scoreTeams(input: MixerInput, teams: readonly (readonly string[])[]): CostBreakdown {
  const model = buildModel(input);
  return evaluate(
    model,
    teams.map((team) =>
      team.map((id) => {
        const i = model.indexOf.get(id);
        if (i === undefined) throw new RangeError(`unknown player id ${id}`);
        return i;
      }),
    ),
  );
}

function checkBudget(budget: MixerBudget): MixerBudget {
  if (!Number.isInteger(budget.restarts) || budget.restarts < 1) {
    throw new RangeError('budget.restarts must be an integer ≥ 1');
  }
  if (!Number.isInteger(budget.swapPasses) || budget.swapPasses < 0) {
    throw new RangeError('budget.swapPasses must be an integer ≥ 0');
  }
  return budget;
}

/** Shuffled position i goes to team i mod k, which fixes the sizes for the whole search. */
function deal(n: number, k: number, rng: Rng): SearchState {
  const order = shuffle(
    Array.from({ length: n }, (_, i) => i),
    rng,
  );
  const members: number[][] = Array.from({ length: k }, () => []);
  const teamOf = new Int32Array(n);
  order.forEach((player, position) => {
    members[position % k].push(player);
    teamOf[player] = position % k;
  });
  return { order, members, teamOf };
}

/** A search state from each player's team, scanned in a seeded order. */
function stateOf(teamOf: Int32Array, k: number, rng: Rng): SearchState {
  const order = shuffle(
    Array.from({ length: teamOf.length }, (_, i) => i),
    rng,
  );
  const members: number[][] = Array.from({ length: k }, () => []);
  for (const player of order) members[teamOf[player]].push(player);
  return { order, members, teamOf: Int32Array.from(teamOf) };
}

interface SearchState {
  order: number[];
  members: number[][];
  teamOf: Int32Array;
}

function improve(model: MixerModel, state: SearchState, passes: number): number[][] {
  const { n, pairWeight: w } = model;
  const { order, members, teamOf } = state;
  const performance =
    model.mode === 'balanced' ? new PerformanceTracker(members, model.prior, model.classMean) : null;
  if (evaluate(model, members).total <= EPS) return members;

  for (let pass = 0; pass < passes; pass++) {
    let improved = false;
    for (let ia = 0; ia < n; ia++) {
      const a = order[ia];
      for (let ib = ia + 1; ib < n; ib++) {
        const b = order[ib];
        const ta = teamOf[a];
        const tb = teamOf[b];
        if (ta === tb) continue;
        let delta = 0;
        for (const x of members[tb]) if (x !== b) delta += w[a * n + x] - w[b * n + x];
        for (const x of members[ta]) if (x !== a) delta += w[b * n + x] - w[a * n + x];
        if (performance) delta += performance.deltaOfSwap(ta, a, tb, b);
        if (delta < -EPS) {
          members[ta][members[ta].indexOf(a)] = b;
          members[tb][members[tb].indexOf(b)] = a;
          teamOf[a] = tb;
          teamOf[b] = ta;
          performance?.refresh(ta, tb);
          improved = true;
        }
      }
    }
    if (!improved || evaluate(model, members).total <= EPS) break;
  }
  return members;
}

/**
 * The balanced-mode cost change of a candidate swap in O(1). It keeps the three
 * highest and three lowest teams (enough to know the extremes once the two teams
 * of the swap are set aside) and the running sum of squared deviations.
 */
class PerformanceTracker {
  private readonly means: Float64Array;
  private readonly top = [0, 0, 0];
  private readonly bottom = [0, 0, 0];
  private ranked = 0;
  private range = 0;
  private squares = 0;

  constructor(
    private readonly members: readonly number[][],
    private readonly prior: Float64Array,
    private readonly classMean: number,
  ) {
    this.means = Float64Array.from(members, (team) => this.meanOf(team));
    this.rank();
  }

  deltaOfSwap(ta: number, a: number, tb: number, b: number): number {
    const { means, classMean } = this;
    const shift = this.prior[b] - this.prior[a];
    const meanA = means[ta] + shift / this.members[ta].length;
    const meanB = means[tb] - shift / this.members[tb].length;
    let max = meanA > meanB ? meanA : meanB;
    let min = meanA < meanB ? meanA : meanB;
    for (let r = 0; r < this.ranked; r++) {
      const t = this.top[r];
      if (t !== ta && t !== tb) {
        if (means[t] > max) max = means[t];
        break;
      }
    }
    for (let r = 0; r < this.ranked; r++) {
      const t = this.bottom[r];
      if (t !== ta && t !== tb) {
        if (means[t] < min) min = means[t];
        break;
      }
    }
    const squares =
      this.squares -
      (means[ta] - classMean) ** 2 -
      (means[tb] - classMean) ** 2 +
      (meanA - classMean) ** 2 +
      (meanB - classMean) ** 2;
    const k = means.length;
    return (
      MIXER_WEIGHTS.performanceSpread * (max - min - this.range) +
      MIXER_WEIGHTS.performanceRms * (Math.sqrt(Math.max(squares, 0) / k) - Math.sqrt(this.squares / k))
    );
  }

  /** Recomputes the two changed teams exactly, so no rounding drift builds up. */
  refresh(ta: number, tb: number): void {
    this.means[ta] = this.meanOf(this.members[ta]);
    this.means[tb] = this.meanOf(this.members[tb]);
    this.rank();
  }

  private meanOf(team: readonly number[]): number {
    let sum = 0;
    for (const i of team) sum += this.prior[i];
    return sum / team.length;
  }

  /** One linear scan for the three highest and lowest means and the squared deviations. */
  private rank(): void {
    const { means, classMean } = this;
    let topLength = 0;
    let bottomLength = 0;
    this.squares = 0;
    for (let t = 0; t < means.length; t++) {
      this.squares += (means[t] - classMean) ** 2;
      topLength = insertRanked(this.top, topLength, t, (x, y) => means[x] > means[y]);
      bottomLength = insertRanked(this.bottom, bottomLength, t, (x, y) => means[x] < means[y]);
    }
    this.ranked = topLength;
    this.range = means[this.top[0]] - means[this.bottom[0]];
  }
}

/** Keeps rank[0, length) ordered by `before` and at most rank.length long; returns the new length. */
function insertRanked(rank: number[], length: number, t: number, before: (x: number, y: number) => boolean): number {
  let at = length;
  while (at > 0 && before(t, rank[at - 1])) at--;
  if (at >= rank.length) return length;
  const grown = Math.min(length + 1, rank.length);
  for (let r = grown - 1; r > at; r--) rank[r] = rank[r - 1];
  rank[at] = t;
  return grown;
}

function toIds(model: MixerModel, teams: number[][]): string[][] {
  // Indices follow id order, so sorting them lists each team by id.
  return teams.map((team) => team.slice().sort((x, y) => x - y).map((i) => model.ids[i]));
}
