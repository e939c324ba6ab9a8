import { useEffect, useRef, useState } from 'react';
import { optionLetter, type PlayerItemView } from '@covalent/shared-types';

export interface OrderAnswerProps {
  item: PlayerItemView;
  sequence: string[];
  onChange: (sequence: string[]) => void;
  disabled: boolean;
}

function move(sequence: string[], from: number, to: number): string[] {
  const next = [...sequence];
  const [step] = next.splice(from, 1);
  if (step !== undefined) next.splice(to, 0, step);
  return next;
}

/** Steps in a list, moved with Up and Down buttons (works by keyboard and with one thumb). */
export function OrderAnswer({ item, sequence, onChange, disabled }: OrderAnswerProps) {
  const [announcement, setAnnouncement] = useState('');
  const [focusTarget, setFocusTarget] = useState<{ id: string; dir: 'up' | 'down' } | null>(null);
  const buttons = useRef(new Map<string, HTMLButtonElement | null>());
  const byId = new Map(item.options.map((o, i) => [o.id, { ...o, letter: optionLetter(i) }]));

  // Keep focus on the moved step's button (or its twin once it reaches the end of the list).
  useEffect(() => {
    if (!focusTarget) return;
    const index = sequence.indexOf(focusTarget.id);
    const atEdge = focusTarget.dir === 'up' ? index === 0 : index === sequence.length - 1;
    const dir = atEdge ? (focusTarget.dir === 'up' ? 'down' : 'up') : focusTarget.dir;
    buttons.current.get(`${focusTarget.id}-${dir}`)?.focus();
  }, [focusTarget, sequence]);

  function shift(index: number, dir: 'up' | 'down') {
    const to = dir === 'up' ? index - 1 : index + 1;
    const id = sequence[index];
    if (id === undefined || to < 0 || to >= sequence.length) return;
    onChange(move(sequence, index, to));
    setFocusTarget({ id, dir });
    setAnnouncement(`${byId.get(id)?.text ?? 'Step'} moved to position ${to + 1} of ${sequence.length}.`);
  }

  return (
    <>
      <ol className="steps" aria-label="Steps, first to last">
        {sequence.map((id, index) => {
          const step = byId.get(id);
          const text = step?.text ?? id;
          return (
            <li key={id} className="step">
              <span className="step-position" aria-hidden="true">
                {index + 1}
              </span>
              <span className="step-text">
                <span className="step-letter">{step?.letter}.</span> {text}
              </span>
              <span className="step-moves">
                <button
                  ref={(el) => void buttons.current.set(`${id}-up`, el)}
                  type="button"
                  className="step-move"
                  aria-label={`Move "${text}" up`}
                  disabled={disabled || index === 0}
                  onClick={() => shift(index, 'up')}
                >
                  <span aria-hidden="true">↑</span>
                </button>
                <button
                  ref={(el) => void buttons.current.set(`${id}-down`, el)}
                  type="button"
                  className="step-move"
                  aria-label={`Move "${text}" down`}
                  disabled={disabled || index === sequence.length - 1}
                  onClick={() => shift(index, 'down')}
                >
                  <span aria-hidden="true">↓</span>
                </button>
              </span>
            </li>
          );
        })}
      </ol>
      <p className="visually-hidden" aria-live="polite">
        {announcement}
      </p>
    </>
  );
}
