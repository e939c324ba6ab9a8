import { useId } from 'react';
import type { RosterChoice } from '@/realtime';

export interface RosterPickerProps {
  roster: RosterChoice[];
  selectedId: string | null;
  onPick: (entry: RosterChoice) => void;
  error?: string;
}

/** The class list to pick yourself from; names already taken cannot be picked. */
export function RosterPicker({ roster, selectedId, onPick, error }: RosterPickerProps) {
  const id = useId();
  return (
    <fieldset className="roster" aria-describedby={error ? `${id}-error` : undefined}>
      <legend>Pick your name</legend>
      <ul className="roster-list">
        {roster.map((entry) => (
          <li key={entry.id}>
            <label className={`choice roster-choice${entry.taken ? ' is-taken' : ''}`}>
              <input
                type="radio"
                name={`${id}-roster`}
                value={entry.id}
                checked={selectedId === entry.id}
                disabled={entry.taken}
                onChange={() => onPick(entry)}
              />
              <span>{entry.displayName}</span>
              {entry.taken && <span className="roster-taken"> (already joined)</span>}
            </label>
          </li>
        ))}
      </ul>
      {error && (
        <p id={`${id}-error`} className="field-error" role="alert">
          {error}
        </p>
      )}
    </fieldset>
  );
}
