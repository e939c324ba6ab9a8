import type { RoundTiming } from '@covalent/shared-types';
import { useCountdown } from '../hooks/useCountdown';

export interface CountdownProps {
  timing: RoundTiming;
}

const STATE_WORDS: Record<RoundTiming['status'], string> = {
  ready: 'Ready',
  open: 'seconds left',
  closed: 'Time is up',
  revealed: 'Revealed',
};

/** Seconds left by the server's deadline (corrected by the measured clock offset). */
export function Countdown({ timing }: CountdownProps) {
  const left = useCountdown(timing);
  const seconds = left === null ? null : Math.ceil(left / 1000);
  return (
    <div className="host-timer" role="timer" aria-label="Time left">
      {seconds !== null && (
        <span className="host-timer-value" data-low={seconds <= 5}>
          {seconds}
        </span>
      )}
      <span className="host-timer-state">{timing.paused ? 'Paused' : STATE_WORDS[timing.status]}</span>
    </div>
  );
}
