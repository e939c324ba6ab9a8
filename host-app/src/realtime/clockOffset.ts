/** One NTP-style exchange: client send time t0, server clock, client receive time t3. */
export interface ClockSample {
  /** serverClock − clientClock, in ms. */
  offsetMs: number;
  roundTripMs: number;
}

/**
 * Offset and round trip of one exchange where the server stamps once (t1 = t2 = serverNow):
 * offset = serverNow − (t0 + t3) / 2, delay = t3 − t0 (RFC 5905 §8 with a zero server hold).
 */
export function clockSample(t0: number, serverNow: number, t3: number): ClockSample {
  return { offsetMs: serverNow - (t0 + t3) / 2, roundTripMs: t3 - t0 };
}

/** The sample with the shortest round trip is the least disturbed by queueing; null when there is none. */
export function bestClockSample(samples: readonly ClockSample[]): ClockSample | null {
  let best: ClockSample | null = null;
  for (const sample of samples) {
    if (sample.roundTripMs < 0) continue; // a clock stepped back mid-exchange: unusable
    if (!best || sample.roundTripMs < best.roundTripMs) best = sample;
  }
  return best;
}
