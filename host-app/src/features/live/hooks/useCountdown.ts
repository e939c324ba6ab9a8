import type { RoundTiming } from '@covalent/shared-types';
import { useEffect, useState } from 'react';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { remainingMs } from '../utils/remainingMs';

/** Milliseconds left in the open round, re-read a few times a second; null when nothing is open. */
export function useCountdown(timing: RoundTiming): number | null {
  const offset = useHostSessionStore((s) => s.clockOffsetMs);
  const [now, setNow] = useState(() => Date.now());
  const ticking = timing.status === 'open' && !timing.paused;

  useEffect(() => {
    if (!ticking) return undefined;
    const timer = setInterval(() => setNow(Date.now()), 250);
    return () => clearInterval(timer);
  }, [ticking]);

  return remainingMs(timing, now, offset);
}
