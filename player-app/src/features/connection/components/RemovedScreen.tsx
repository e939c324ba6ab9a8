import { leaveSession } from '@/realtime';

export interface RemovedScreenProps {
  message: string;
}

/** Shown when the host removed this player: calm, no alarm. */
export function RemovedScreen({ message }: RemovedScreenProps) {
  return (
    <section aria-labelledby="removed-title">
      <h1 id="removed-title" className="page-title">
        You've left this session
      </h1>
      <p>{message || 'Your teacher has taken you out of this session.'}</p>
      <p>If that seems wrong, talk to your teacher.</p>
      <button type="button" className="button-secondary" onClick={leaveSession}>
        Back to the join screen
      </button>
    </section>
  );
}
