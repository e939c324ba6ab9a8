import { optionLetter, type PlayerItemView } from '@covalent/shared-types';

export interface OptionsPreviewProps {
  item: PlayerItemView;
}

/**
 * The item's options to read while the team talks it over (numbered: only the called member
 * answers, but everyone should see what there is to choose from). Nothing to press here.
 */
export function OptionsPreview({ item }: OptionsPreviewProps) {
  if (item.type !== 'single' && item.type !== 'multi' && item.type !== 'order') return null;
  // Named apart from the answer buttons' "Options" list: these are to read, not to press.
  const label = item.type === 'order' ? 'Steps to talk over' : 'Options to talk over';
  return (
    <ul className="options options-preview" aria-label={label}>
      {item.options.map((option, index) => (
        <li key={option.id} className="option option-static">
          <span className="option-letter">{optionLetter(index)}</span>
          <span className="visually-hidden">.</span> <span className="option-text">{option.text}</span>
        </li>
      ))}
    </ul>
  );
}
