import { describe, expect, it } from 'vitest';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { bestClockSample, clockSample } from './clockOffset';
import { HostConnection } from './HostConnection';
import { FakeHostSocket } from './testing/FakeHostSocket';

// NTP on-wire offset θ = ((T2 − T1) + (T3 − T4)) / 2 and delay δ = (T4 − T1) − (T3 − T2),
// RFC 5905 §8 (from memory). With one server stamp (T2 = T3 = serverNow) θ = serverNow − (T1 + T4) / 2.
describe('clockSample', () => {
  it('recovers a 500 ms offset exactly when the two legs take the same time (worked example)', () => {
    // Server runs 500 ms ahead; 60 ms out, 60 ms back: sent at 10 000, stamped 10 560, received 10 120.
    expect(clockSample(10_000, 10_560, 10_120)).toEqual({ offsetMs: 500, roundTripMs: 120 });
  });

  it('is off by half the asymmetry when the legs differ (RFC 5905: error ≤ δ/2)', () => {
    // 100 ms out, 20 ms back: stamped 10 000 + 100 + 500, received 10 120 → 540, i.e. (100 − 20) / 2 too high.
    const sample = clockSample(10_000, 10_600, 10_120);
    expect(sample.offsetMs).toBe(540);
    expect(Math.abs(sample.offsetMs - 500)).toBeLessThanOrEqual(sample.roundTripMs / 2);
  });
});

describe('bestClockSample', () => {
  it('keeps the sample with the shortest round trip and skips impossible ones', () => {
    const samples = [
      { offsetMs: 540, roundTripMs: 120 },
      { offsetMs: 503, roundTripMs: 14 },
      { offsetMs: 900, roundTripMs: -5 },
      { offsetMs: 470, roundTripMs: 60 },
    ];
    expect(bestClockSample(samples)).toEqual({ offsetMs: 503, roundTripMs: 14 });
    expect(bestClockSample([])).toBeNull();
  });
});

describe(HostConnection.name, () => {
  it('runs five clock:sync exchanges on connect and stores the offset of the fastest one', async () => {
    // Client clock: each exchange reads t0 then t3; the third exchange is the quick one.
    const reads = [0, 200, 1_000, 1_100, 2_000, 2_010, 3_000, 3_080, 4_000, 4_300];
    const serverStamps = [600, 1_550, 2_505, 3_560, 4_700];
    const socket = new FakeHostSocket();
    let stamp = 0;
    socket.serverNow = () => serverStamps[stamp++]!;
    const connection = new HostConnection({ sessionId: 'sess-1', createSocket: () => socket, now: () => reads.shift()! });
    connection.start();

    const best = await connection.syncClock();

    expect(socket.emitted.filter((e) => e.event === 'clock:sync')).toHaveLength(5);
    // Third exchange: 2 505 − (2 000 + 2 010) / 2 = 500, round trip 10.
    expect(best).toEqual({ offsetMs: 500, roundTripMs: 10 });
    expect(useHostSessionStore.getState().clockOffsetMs).toBe(500);
    connection.stop();
    expect(socket.disconnected).toBe(true);
  });
});
