import { useState } from 'react';
import { CatchupFeedback, CatchupFinish, CatchupPicker, CatchupQuestion, readCatchupCode, useCatchup } from '@/features/catchup';

function CatchupRun({ code }: { code: string }) {
  const { state, start, answer, next } = useCatchup(code);

  switch (state.phase) {
    case 'loading':
      return <p className="loading">Loading…</p>;
    case 'failed':
      return (
        <p className="notice" role="alert">
          {state.message}
        </p>
      );
    case 'pick':
      return (
        <>
          <h1 className="page-title">Catch-up</h1>
          <CatchupPicker info={state.info} pending={state.pending} error={state.error} onStart={(id) => void start(id)} />
        </>
      );
    case 'playing': {
      const item = state.run.items[state.index];
      if (!item) return null;
      return state.feedback ? (
        <CatchupFeedback
          item={item}
          feedback={state.feedback}
          answered={state.answered}
          last={state.index === state.run.items.length - 1}
          onNext={next}
        />
      ) : (
        <CatchupQuestion
          key={item.itemId}
          item={item}
          position={state.index}
          count={state.run.items.length}
          pending={state.pending}
          error={state.error}
          onAnswer={(response) => void answer(response)}
        />
      );
    }
    case 'finished':
      return <CatchupFinish right={state.right} total={state.total} nextDueAt={state.nextDueAt} now={Date.now()} />;
  }
}

/** `/play/catchup/<code>`: a student's self-paced run through the items they missed. */
export function CatchupPage() {
  // Read once: the code is the page's identity.
  const [code] = useState(() => readCatchupCode(window.location.pathname) ?? '');
  return (
    <div className="page">
      <header className="page-header">
        <p className="wordmark">
          <span className="wordmark-mark" aria-hidden="true" />
          Covalent
        </p>
      </header>
      <main className="page-main">
        <div className="panel">
          <CatchupRun code={code} />
        </div>
      </main>
    </div>
  );
}
