import { lazy, Suspense } from 'react';
import { useSessionStore } from '@/stores/useSessionStore';
import { ErrorBoundary } from './ErrorBoundary';

const JoinPage = lazy(() => import('@/pages/JoinPage').then((m) => ({ default: m.JoinPage })));
const GamePage = lazy(() => import('@/pages/GamePage').then((m) => ({ default: m.GamePage })));

export function App() {
  const joined = useSessionStore((s) => s.phase === 'joined');
  return (
    <ErrorBoundary>
      <Suspense fallback={<p className="loading">Loading…</p>}>{joined ? <GamePage /> : <JoinPage />}</Suspense>
    </ErrorBoundary>
  );
}
