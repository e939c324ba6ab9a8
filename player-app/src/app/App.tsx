import { lazy, Suspense } from 'react';
import { ErrorBoundary } from './ErrorBoundary';

const JoinPage = lazy(() => import('@/pages/JoinPage').then((m) => ({ default: m.JoinPage })));

export function App() {
  return (
    <ErrorBoundary>
      <Suspense fallback={<p className="loading">Loading…</p>}>
        <JoinPage />
      </Suspense>
    </ErrorBoundary>
  );
}
