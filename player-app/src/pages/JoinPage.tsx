import { useState } from 'react';
import { JoinForm, JoinedNotice, PrivacyNote, readJoinCodeFromUrl } from '@/features/join';
import { useSessionStore } from '@/stores/useSessionStore';

export function JoinPage() {
  // Read once: later edits to the field must not be overwritten by the URL.
  const [initialCode] = useState(() => readJoinCodeFromUrl(window.location));
  const phase = useSessionStore((s) => s.phase);
  const nickname = useSessionStore((s) => s.nickname);

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
          {phase === 'joined' && nickname ? (
            <JoinedNotice nickname={nickname} />
          ) : (
            <>
              <h1 className="page-title">Join the review</h1>
              <JoinForm initialCode={initialCode} />
            </>
          )}
        </div>
      </main>
      <footer className="page-footer">
        <PrivacyNote />
      </footer>
    </div>
  );
}
