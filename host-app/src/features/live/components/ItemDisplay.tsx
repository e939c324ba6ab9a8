import { optionLetter, type PlayerItemView } from '@covalent/shared-types';

export interface ItemDisplayProps {
  item: PlayerItemView;
}

const HINTS: Partial<Record<PlayerItemView['type'], string>> = {
  multi: 'Choose all that apply.',
  order: 'Put the steps in order.',
  text: 'Type a short answer.',
};

/** The item as the class sees it: prompt and lettered options, all in one neutral style. */
export function ItemDisplay({ item }: ItemDisplayProps) {
  const hint = item.type === 'numeric' ? `Answer with a number${item.unitHint ? ` in ${item.unitHint}` : ''}.` : HINTS[item.type];
  return (
    <div className="host-main host-item">
      <h2 className="host-prompt">{item.prompt}</h2>
      {item.imageUrl && <img className="host-item-image" src={item.imageUrl} alt="Picture for this item" />}
      {hint && <p className="host-answer-hint">{hint}</p>}
      {item.type === 'truefalse' ? (
        <ul className="host-options" aria-label="Options">
          <li className="host-option">True</li>
          <li className="host-option">False</li>
        </ul>
      ) : (
        item.options.length > 0 && (
          <ol
            className={item.type === 'order' ? 'host-options host-options-steps' : 'host-options'}
            aria-label={item.type === 'order' ? 'Steps' : 'Options'}
          >
            {item.options.map((option, index) => (
              <li key={option.id} className="host-option">
                <span className="host-option-letter">{optionLetter(index)}</span>
                <span>{option.text}</span>
              </li>
            ))}
          </ol>
        )
      )}
    </div>
  );
}
