import { useState, type FormEvent } from 'react';
import type { CatchupInfoResponse } from '@covalent/shared-types';
import { RosterPicker } from '@/features/join';

export interface CatchupPickerProps {
  info: CatchupInfoResponse;
  pending: boolean;
  error: string | null;
  onStart: (rosterEntryId: string) => void;
}

/** The names with items to catch up on; the student picks theirs and starts. */
export function CatchupPicker({ info, pending, error, onStart }: CatchupPickerProps) {
  const [selected, setSelected] = useState<string | null>(null);
  const [missing, setMissing] = useState(false);
  const roster = info.students.map((s) => ({ id: s.rosterEntryId, displayName: s.displayName, taken: false }));

  function submit(e: FormEvent) {
    e.preventDefault();
    if (!selected) return setMissing(true);
    onStart(selected);
  }

  return (
    <form className="join-form" onSubmit={submit} noValidate>
      <p>{info.title}</p>
      <RosterPicker
        roster={roster}
        selectedId={selected}
        onPick={(entry) => {
          setSelected(entry.id);
          setMissing(false);
        }}
        error={missing ? 'Pick your name to start.' : undefined}
      />
      {error && (
        <p className="form-error" role="alert">
          {error}
        </p>
      )}
      <button type="submit" className="button-primary" disabled={pending}>
        {pending ? 'Starting…' : 'Start'}
      </button>
    </form>
  );
}
