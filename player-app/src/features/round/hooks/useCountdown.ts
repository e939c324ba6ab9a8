import { useEffect, useState } from 'react';
import type { RoundTiming } from '@covalent/shared-types';
import { remainingMs } from '@/realtime';
import { useConnectionStore } from '@/stores/useConnectionStore';

export interface Countdown {
  /** Whole seconds left, rounded up, or null when the round has no running deadline. */
  secondsLeft: number | null;
  /** Share of the limit left, 0–1. */
  fraction: number;
  paused: boolean;
}

/** Display only: the server decides when time is up. */
export function useCountdown(timing: RoundTiming): Countdown {
  const offsetMs = useConnectionStore((s) => s.offsetMs);
  const [now, setNow] = useState(() => Date.now());
  const running = timing.deadlineAt !== null && !timing.paused;

  useEffect(() => {
    if (!running) return;
    const id = window.setInterval(() => setNow(Date.now()), 250);
    return () => window.clearInterval(id);
  }, [running]);

  if (timing.deadlineAt === null) return { secondsLeft: null, fraction: 0, paused: timing.paused };
  // While paused the deadline is frozen: measure it from the server's own clock at send time.
  const left = timing.paused
    ? Math.max(0, timing.deadlineAt - timing.serverNow)
    : remainingMs(timing.deadlineAt, now, offsetMs);
  return {
    secondsLeft: Math.ceil(left / 1000),
    fraction: timing.limitMs > 0 ? Math.min(1, left / timing.limitMs) : 0,
    paused: timing.paused,
  };
}
