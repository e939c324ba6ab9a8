import { useState } from 'react';
import { JoinForm, PrivacyNote, readJoinCodeFromUrl } from '@/features/join';
import { useConnectionStore } from '@/stores/useConnectionStore';

export function JoinPage() {
  // Read once: later edits to the field must not be overwritten by the URL.
  const [initialCode] = useState(() => readJoinCodeFromUrl(window.location));
  // Why a stored token stopped working (session ended, removed), if it did.
  const refusedMessage = useConnectionStore((s) => s.refusedMessage);

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
          <h1 className="page-title">Join the review</h1>
          {refusedMessage && <p className="notice">{refusedMessage}</p>}
          <JoinForm initialCode={initialCode} />
        </div>
      </main>
      <footer className="page-footer">
        <PrivacyNote />
      </footer>
    </div>
  );
}
