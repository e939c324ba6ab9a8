import { useEffect, useRef, useState } from 'react';
import type { CatchupItemView, ItemResponse } from '@covalent/shared-types';
import { ChoiceAnswer, emptyDraft, isCompleteDraft, OrderAnswer, TypedAnswer } from '@/features/round';

export interface CatchupQuestionProps {
  item: CatchupItemView;
  position: number;
  count: number;
  pending: boolean;
  error: string | null;
  onAnswer: (response: ItemResponse) => void;
}

/** One due item with the round's answer controls; nothing is sent until "Check answer". */
export function CatchupQuestion({ item, position, count, pending, error, onAnswer }: CatchupQuestionProps) {
  const [draft, setDraft] = useState<ItemResponse | null>(() => emptyDraft(item));
  const heading = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    heading.current?.focus();
  }, [item.itemId]);

  function submit() {
    if (isCompleteDraft(draft) && !pending) onAnswer(draft);
  }

  let controls;
  if (item.type === 'order') {
    controls = (
      <OrderAnswer
        item={item}
        sequence={draft?.type === 'order' ? draft.sequence : []}
        onChange={(sequence) => setDraft({ type: 'order', sequence })}
        disabled={pending}
      />
    );
  } else if (item.type === 'numeric' || item.type === 'text') {
    const kind = item.type;
    controls = (
      <TypedAnswer
        kind={kind}
        value={draft?.type === kind ? draft.text : ''}
        onChange={(text) => setDraft({ type: kind, text })}
        onSubmit={submit}
        disabled={pending}
        unitHint={kind === 'numeric' ? item.unitHint : null}
      />
    );
  } else {
    controls = <ChoiceAnswer item={item} value={draft} onChange={setDraft} disabled={pending} votes={null} members={[]} playerId="" />;
  }

  return (
    <section className="answer" aria-labelledby="catchup-prompt">
      <p className="round-count">
        Item {position + 1} of {count}
      </p>
      <h1 id="catchup-prompt" ref={heading} tabIndex={-1} className="prompt">
        {item.prompt}
      </h1>
      {item.imageUrl && <img className="item-image" src={item.imageUrl} alt="" />}
      {controls}
      {error && (
        <p className="form-error" role="alert">
          {error}
        </p>
      )}
      <div className="answer-actions">
        <button type="button" className="button-primary" disabled={pending || !isCompleteDraft(draft)} onClick={submit}>
          {pending ? 'Checking…' : 'Check answer'}
        </button>
      </div>
    </section>
  );
}
