import { Flex, Text } from '@radix-ui/themes';
import { useId } from 'react';

export interface TrueFalseKeyFieldProps {
  value: boolean | null;
  onChange: (value: boolean) => void;
  errors: string[];
}

/** Whether the statement in the prompt is true. */
export function TrueFalseKeyField({ value, onChange, errors }: TrueFalseKeyFieldProps) {
  const id = useId();
  return (
    <fieldset className="plain-fieldset" aria-describedby={errors.length ? `${id}-err` : undefined}>
      <legend>
        <Text size="2" weight="bold">
          The statement is
        </Text>
      </legend>
      <Flex gap="5" mt="2">
        {[true, false].map((option) => (
          <Text as="label" size="3" key={String(option)}>
            <Flex gap="2" align="center">
              <input type="radio" name={`${id}-tf`} checked={value === option} onChange={() => onChange(option)} />
              {option ? 'True' : 'False'}
            </Flex>
          </Text>
        ))}
      </Flex>
      {errors.length > 0 && (
        <Text id={`${id}-err`} size="2" color="red">
          {errors.join(' ')}
        </Text>
      )}
    </fieldset>
  );
}
