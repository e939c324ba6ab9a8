import { optionLetter } from '@covalent/shared-types';
import { Button, Flex, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { draftOption, type DraftOption } from '../utils/itemDraft';

export interface ChoiceOptionsEditorProps {
  multiple: boolean;
  options: DraftOption[];
  onChange: (options: DraftOption[]) => void;
  /** Problems with the list as a whole (count, which is correct). */
  listErrors: string[];
  /** Problems per option, by index. */
  optionErrors: string[][];
}

const MAX_OPTIONS = 6;
const MIN_OPTIONS = 2;

/** Options A, B, C… with their text and which are correct (one for single, any number for multi). */
export function ChoiceOptionsEditor({ multiple, options, onChange, listErrors, optionErrors }: ChoiceOptionsEditorProps) {
  const groupId = useId();
  const update = (index: number, patch: Partial<DraftOption>) =>
    onChange(options.map((o, i) => (i === index ? { ...o, ...patch } : o)));
  const markCorrect = (index: number, checked: boolean) =>
    onChange(options.map((o, i) => (multiple ? (i === index ? { ...o, correct: checked } : o) : { ...o, correct: i === index })));

  return (
    <fieldset className="plain-fieldset" aria-describedby={listErrors.length ? `${groupId}-err` : undefined}>
      <legend>
        <Text size="2" weight="bold">
          Options
        </Text>{' '}
        <Text size="2" color="gray">
          {multiple ? 'Tick every correct option.' : 'Choose the one correct option.'}
        </Text>
      </legend>
      <Flex direction="column" gap="3" mt="2">
        {options.map((option, i) => {
          const letter = optionLetter(i);
          const errors = optionErrors[i] ?? [];
          const errorId = `${groupId}-${i}-err`;
          return (
            <Flex key={option.key} direction="column" gap="1">
              <Flex gap="3" align="center">
                <Text weight="bold" aria-hidden="true" className="preview-letter">
                  {letter}
                </Text>
                <TextField.Root
                  size="3"
                  className="grow-field"
                  aria-label={`Option ${letter}`}
                  aria-invalid={errors.length > 0 || undefined}
                  aria-describedby={errors.length ? errorId : undefined}
                  color={errors.length ? 'red' : undefined}
                  value={option.text}
                  onChange={(e) => update(i, { text: e.target.value })}
                />
                <Text as="label" size="2" className="choice-correct">
                  <input
                    type={multiple ? 'checkbox' : 'radio'}
                    name={`${groupId}-correct`}
                    checked={option.correct}
                    aria-label={`Option ${letter} is correct`}
                    onChange={(e) => markCorrect(i, e.target.checked)}
                  />
                  <span aria-hidden="true">Correct</span>
                </Text>
                <Button
                  type="button"
                  size="1"
                  variant="ghost"
                  color="gray"
                  disabled={options.length <= MIN_OPTIONS}
                  aria-label={`Remove option ${letter}`}
                  onClick={() => onChange(options.filter((_, j) => j !== i))}
                >
                  Remove
                </Button>
              </Flex>
              {errors.length > 0 && (
                <Text id={errorId} size="2" color="red" ml="6">
                  {errors.join(' ')}
                </Text>
              )}
            </Flex>
          );
        })}
        {listErrors.length > 0 && (
          <Text id={`${groupId}-err`} size="2" color="red">
            {listErrors.join(' ')}
          </Text>
        )}
        <div>
          <Button type="button" variant="soft" size="2" disabled={options.length >= MAX_OPTIONS} onClick={() => onChange([...options, draftOption()])}>
            Add option
          </Button>
        </div>
      </Flex>
    </fieldset>
  );
}
