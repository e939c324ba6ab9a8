import { useId } from 'react';

export interface TypedAnswerProps {
  kind: 'numeric' | 'text';
  value: string;
  onChange: (text: string) => void;
  onSubmit: () => void;
  disabled: boolean;
  /** numeric: the unit shown beside the input. */
  unitHint: string | null;
}

/** A typed answer: a number (with its unit beside it) or a word or phrase. */
export function TypedAnswer({ kind, value, onChange, onSubmit, disabled, unitHint }: TypedAnswerProps) {
  const id = useId();
  const unitId = `${id}-unit`;
  return (
    <div className="field">
      <label htmlFor={id}>Your answer</label>
      <div className="typed-answer">
        <input
          id={id}
          className="input"
          type="text"
          inputMode={kind === 'numeric' ? 'decimal' : 'text'}
          autoComplete="off"
          autoCorrect="off"
          spellCheck={false}
          enterKeyHint="send"
          maxLength={200}
          value={value}
          disabled={disabled}
          aria-describedby={unitHint ? unitId : undefined}
          onChange={(e) => onChange(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') onSubmit();
          }}
        />
        {unitHint && (
          <span id={unitId} className="unit-hint">
            <span className="visually-hidden">Unit:</span> {unitHint}
          </span>
        )}
      </div>
    </div>
  );
}
