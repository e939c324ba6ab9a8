import { lazy, Suspense } from 'react';
import { readCatchupCode } from '@/features/catchup/utils/readCatchupCode';
import { useSessionStore } from '@/stores/useSessionStore';
import { ErrorBoundary } from './ErrorBoundary';

const JoinPage = lazy(() => import('@/pages/JoinPage').then((m) => ({ default: m.JoinPage })));
const GamePage = lazy(() => import('@/pages/GamePage').then((m) => ({ default: m.GamePage })));
const CatchupPage = lazy(() => import('@/pages/CatchupPage').then((m) => ({ default: m.CatchupPage })));

export function App() {
  const joined = useSessionStore((s) => s.phase === 'joined');
  // A catch-up link is its own page: no live session, no socket.
  if (readCatchupCode(window.location.pathname) !== null) {
    return (
      <ErrorBoundary>
        <Suspense fallback={<p className="loading">Loading…</p>}>
          <CatchupPage />
        </Suspense>
      </ErrorBoundary>
    );
  }
  return (
    <ErrorBoundary>
      <Suspense fallback={<p className="loading">Loading…</p>}>{joined ? <GamePage /> : <JoinPage />}</Suspense>
    </ErrorBoundary>
  );
}
