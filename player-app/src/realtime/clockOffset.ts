/**
 * Clock offset between this device and the server, NTP style (RFC 5905 §8, from memory).
 * With t0 = client send, t1 = server receive, t2 = server send, t3 = client receive:
 *   offset θ = ((t1 − t0) + (t2 − t3)) / 2      delay δ = (t3 − t0) − (t2 − t1)
 * The server answers `clock:sync` with one reading, so t1 = t2 = serverNow.
 */
export interface ClockSample {
  /** Server clock minus client clock, in ms: add it to `Date.now()` to read the server clock. */
  offsetMs: number;
  /** Round-trip delay, in ms; the offset's error is at most δ / 2. */
  roundTripMs: number;
}

export function clockSample(t0: number, serverNow: number, t3: number): ClockSample {
  const t1 = serverNow;
  const t2 = serverNow;
  return {
    offsetMs: (t1 - t0 + (t2 - t3)) / 2,
    roundTripMs: t3 - t0 - (t2 - t1),
  };
}

/**
 * The sample with the lowest round trip: the one least disturbed by queueing, as in NTP's
 * clock filter (RFC 5905 §10, from memory). Null when there are no usable samples.
 */
export function bestClockSample(samples: readonly ClockSample[]): ClockSample | null {
  let best: ClockSample | null = null;
  for (const sample of samples) {
    // A negative delay means the clock jumped mid-sample; it says nothing trustworthy.
    if (!Number.isFinite(sample.offsetMs) || sample.roundTripMs < 0) continue;
    if (best === null || sample.roundTripMs < best.roundTripMs) best = sample;
  }
  return best;
}

/** Milliseconds left until a server-clock deadline, as this device sees it; never negative. */
export function remainingMs(deadlineAt: number, clientNow: number, offsetMs: number): number {
  return Math.max(0, deadlineAt - (clientNow + offsetMs));
}
