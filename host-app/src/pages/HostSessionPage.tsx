import { useEffect } from 'react';
import { useParams } from 'react-router-dom';
import { HostScreen } from '@/features/live/components/HostScreen';
import { closeHostSession, openHostSession } from '@/realtime';

/** The projected host screen of one session, full-screen outside the app shell. */
export function HostSessionPage() {
  const { sessionId = '' } = useParams();

  useEffect(() => {
    openHostSession(sessionId);
    return () => closeHostSession();
  }, [sessionId]);

  return <HostScreen origin={window.location.origin} />;
}
