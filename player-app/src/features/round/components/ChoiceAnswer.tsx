import { useId } from 'react';
import { optionLetter, type ItemResponse, type PlayerItemView, type TeamView, type VoteView } from '@covalent/shared-types';
import { choiceOptions, choiceResponse, pickedOptionIds } from '../utils/describeResponse';
import { VoteNames } from './VoteNames';

export interface ChoiceAnswerProps {
  item: PlayerItemView;
  value: ItemResponse | null;
  onChange: (next: ItemResponse) => void;
  disabled: boolean;
  /** huddle: the team's live votes, shown beside each option. */
  votes: VoteView[] | null;
  members: TeamView['members'];
  playerId: string;
}

/** Lettered option buttons for single, true/false and multi items, all in one neutral style. */
export function ChoiceAnswer({ item, value, onChange, disabled, votes, members, playerId }: ChoiceAnswerProps) {
  const id = useId();
  const options = choiceOptions(item);
  const picked = pickedOptionIds(value);
  const multi = item.type === 'multi';

  function press(optionId: string) {
    if (!multi) return onChange(choiceResponse(item, optionId));
    const next = picked.includes(optionId) ? picked.filter((p) => p !== optionId) : [...picked, optionId];
    onChange({ type: 'multi', optionIds: next });
  }

  return (
    <ul className="options" aria-label={multi ? 'Options — pick all that apply' : 'Options'}>
      {options.map((option, index) => {
        const optionVotes = votes?.filter((v) => pickedOptionIds(v.response).includes(option.id)) ?? [];
        const votesId = `${id}-${index}-votes`;
        return (
          <li key={option.id} className="option-row">
            <button
              type="button"
              className="option"
              aria-pressed={picked.includes(option.id)}
              aria-describedby={optionVotes.length > 0 ? votesId : undefined}
              disabled={disabled}
              onClick={() => press(option.id)}
            >
              <span className="option-letter">{optionLetter(index)}</span>
              <span className="visually-hidden">.</span> <span className="option-text">{option.text}</span>
            </button>
            <VoteNames id={votesId} votes={optionVotes} members={members} playerId={playerId} />
          </li>
        );
      })}
    </ul>
  );
}
