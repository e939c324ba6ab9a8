import { describe, expect, it } from 'vitest';
import { makeTiming } from '../testing/liveFactories';
import { remainingMs } from './remainingMs';

describe('remainingMs', () => {
  it('counts down to the server deadline using the clock offset, not the raw client clock', () => {
    // Server is 2 s ahead of this laptop: at client 10 000 the server reads 12 000; deadline 20 000 → 8 s.
    const timing = makeTiming({ deadlineAt: 20_000, serverNow: 12_000 });
    expect(remainingMs(timing, 10_000, 2_000)).toBe(8_000);
    expect(remainingMs(timing, 10_000, 0)).toBe(10_000);
  });

  it('never goes below zero and stands still while paused', () => {
    expect(remainingMs(makeTiming({ deadlineAt: 20_000 }), 30_000, 0)).toBe(0);
    const paused = makeTiming({ deadlineAt: 20_000, serverNow: 14_000, paused: true });
    expect(remainingMs(paused, 99_000, 0)).toBe(6_000);
  });

  it('is null when no window is open', () => {
    expect(remainingMs(makeTiming({ status: 'closed' }), 0, 0)).toBeNull();
    expect(remainingMs(makeTiming({ deadlineAt: null }), 0, 0)).toBeNull();
  });
});
