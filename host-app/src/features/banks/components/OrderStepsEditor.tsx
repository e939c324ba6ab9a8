import { Button, Flex, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { draftOption, type DraftOption } from '../utils/itemDraft';
import { moveInList } from '../utils/moveInList';

export interface OrderStepsEditorProps {
  steps: DraftOption[];
  onChange: (steps: DraftOption[]) => void;
  listErrors: string[];
  stepErrors: string[][];
}

const MIN_STEPS = 3;
const MAX_STEPS = 8;

/** The steps of a procedure, written in their correct order; students get them shuffled. */
export function OrderStepsEditor({ steps, onChange, listErrors, stepErrors }: OrderStepsEditorProps) {
  const groupId = useId();
  const update = (index: number, text: string) => onChange(steps.map((s, i) => (i === index ? { ...s, text } : s)));

  return (
    <fieldset className="plain-fieldset">
      <legend>
        <Text size="2" weight="bold">
          Steps, in the correct order
        </Text>{' '}
        <Text size="2" color="gray">
          Write them first to last; students see them shuffled.
        </Text>
      </legend>
      <Flex direction="column" gap="3" mt="2">
        {steps.map((step, i) => {
          const errors = stepErrors[i] ?? [];
          const errorId = `${groupId}-${i}-err`;
          return (
            <Flex key={step.key} direction="column" gap="1">
              <Flex gap="2" align="center">
                <Text weight="bold" aria-hidden="true" className="preview-letter">
                  {i + 1}.
                </Text>
                <TextField.Root
                  size="3"
                  className="grow-field"
                  aria-label={`Step ${i + 1}`}
                  aria-invalid={errors.length > 0 || undefined}
                  aria-describedby={errors.length ? errorId : undefined}
                  color={errors.length ? 'red' : undefined}
                  value={step.text}
                  onChange={(e) => update(i, e.target.value)}
                />
                <Button type="button" size="1" variant="soft" color="gray" disabled={i === 0} aria-label={`Move step ${i + 1} up`} onClick={() => onChange(moveInList(steps, i, i - 1))}>
                  Up
                </Button>
                <Button
                  type="button"
                  size="1"
                  variant="soft"
                  color="gray"
                  disabled={i === steps.length - 1}
                  aria-label={`Move step ${i + 1} down`}
                  onClick={() => onChange(moveInList(steps, i, i + 1))}
                >
                  Down
                </Button>
                <Button
                  type="button"
                  size="1"
                  variant="ghost"
                  color="gray"
                  disabled={steps.length <= MIN_STEPS}
                  aria-label={`Remove step ${i + 1}`}
                  onClick={() => onChange(steps.filter((_, j) => j !== i))}
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
          <Text size="2" color="red">
            {listErrors.join(' ')}
          </Text>
        )}
        <div>
          <Button type="button" variant="soft" size="2" disabled={steps.length >= MAX_STEPS} onClick={() => onChange([...steps, draftOption()])}>
            Add step
          </Button>
        </div>
      </Flex>
    </fieldset>
  );
}
