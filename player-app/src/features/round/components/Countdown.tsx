import type { RoundTiming } from '@covalent/shared-types';
import { useCountdown } from '../hooks/useCountdown';

export interface CountdownProps {
  timing: RoundTiming;
}

/** Time left as text and a plain bar; no flashing, no sound. The server decides when time is up. */
export function Countdown({ timing }: CountdownProps) {
  const { secondsLeft, fraction, paused } = useCountdown(timing);
  if (secondsLeft === null && !paused) return null;
  const text = secondsLeft === null ? '' : `${secondsLeft} s left`;
  return (
    <div className="countdown">
      {/* role=timer is not announced on every tick, which keeps screen readers calm. */}
      <p className="countdown-text" role="timer" aria-atomic="true">
        {paused ? `Paused by your teacher${text ? ` — ${text}` : ''}` : text}
      </p>
      <div className="countdown-bar" aria-hidden="true">
        <span style={{ width: `${Math.round(fraction * 100)}%` }} />
      </div>
    </div>
  );
}
