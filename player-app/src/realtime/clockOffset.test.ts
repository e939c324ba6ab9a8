import { describe, expect, it } from 'vitest';
import { bestClockSample, clockSample, remainingMs } from './clockOffset';

// Formula: RFC 5905 §8, offset θ = ((T2 − T1) + (T3 − T4)) / 2 and delay δ = (T4 − T1) − (T3 − T2)
// in the RFC's 1-based names (from memory); here t0..t3 with t1 = t2 = the server's reading.

describe('clockSample', () => {
  it('computes offset and delay for a worked example with a symmetric path', () => {
    // Worked by hand: the server runs 500 ms ahead, 100 ms each way.
    // Sent at client 1000 → server reads 1000 + 100 + 500 = 1600 → back at client 1200.
    // θ = ((1600 − 1000) + (1600 − 1200)) / 2 = (600 + 400) / 2 = 500; δ = 1200 − 1000 − 0 = 200.
    expect(clockSample(1000, 1600, 1200)).toEqual({ offsetMs: 500, roundTripMs: 200 });
  });

  it('gives a negative offset when the server clock is behind', () => {
    // Server 2 s behind, 50 ms each way: t0 = 10000, serverNow = 10050 − 2000 = 8050, t3 = 10100.
    expect(clockSample(10_000, 8_050, 10_100)).toEqual({ offsetMs: -2000, roundTripMs: 100 });
  });

  it('errs by at most half the round trip on an asymmetric path', () => {
    // RFC 5905 §8 bounds the error by δ/2 (from memory). True offset 300 ms; 10 ms out, 190 ms back.
    const trueOffset = 300;
    const sample = clockSample(0, 0 + 10 + trueOffset, 200);
    expect(sample.roundTripMs).toBe(200);
    expect(Math.abs(sample.offsetMs - trueOffset)).toBeLessThanOrEqual(sample.roundTripMs / 2);
    expect(sample.offsetMs).toBe(210); // ((310 − 0) + (310 − 200)) / 2 = (310 + 110) / 2
  });
});

describe('bestClockSample', () => {
  it('keeps the sample with the lowest round trip, not the mean', () => {
    const samples = [
      clockSample(0, 700, 400), // δ 400, θ 500
      clockSample(1000, 1540, 1080), // δ 80, θ 500
      clockSample(2000, 2900, 2600), // δ 600, θ 600: a queued reply
      clockSample(3000, 3530, 3090), // δ 90, θ 485
    ];
    expect(bestClockSample(samples)).toEqual({ offsetMs: 500, roundTripMs: 80 });
  });

  it('returns null without samples', () => {
    expect(bestClockSample([])).toBeNull();
  });

  it('skips a sample taken across a backwards clock jump', () => {
    const jumped = clockSample(5000, 5000, 4000); // δ −1000
    const good = clockSample(0, 100, 300);
    expect(bestClockSample([jumped, good])).toEqual(good);
  });
});

describe('remainingMs', () => {
  it('corrects the deadline by the offset', () => {
    // Deadline at server 20_000; client reads 9_000 while the server is 10_000 ahead → 1 s left.
    expect(remainingMs(20_000, 9_000, 10_000)).toBe(1000);
  });

  it('never goes below zero', () => {
    expect(remainingMs(1000, 5000, 0)).toBe(0);
  });
});
