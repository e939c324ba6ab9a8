import { Flex, Text, TextField } from '@radix-ui/themes';
import { useId, type ComponentPropsWithoutRef } from 'react';

export interface FormFieldProps
  extends Omit<ComponentPropsWithoutRef<'input'>, 'id' | 'size' | 'color' | 'defaultValue' | 'value' | 'type'> {
  label: string;
  /** Shown under the label, tied to the input with aria-describedby. */
  hint?: string;
  /** Problems with this field; the first is tied to the input. */
  errors?: string[];
  type?: 'text' | 'email' | 'password';
  value: string;
}

/** A labelled text input with its hint and errors read out by screen readers. */
export function FormField({ label, hint, errors = [], type = 'text', ...inputProps }: FormFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, errors.length ? errorId : null].filter(Boolean).join(' ') || undefined;

  return (
    <Flex direction="column" gap="1">
      <Text as="label" htmlFor={id} size="2" weight="bold">
        {label}
      </Text>
      {hint && (
        <Text id={hintId} size="2" color="gray">
          {hint}
        </Text>
      )}
      <TextField.Root
        id={id}
        type={type}
        size="3"
        aria-invalid={errors.length > 0 || undefined}
        aria-describedby={describedBy}
        color={errors.length ? 'red' : undefined}
        {...inputProps}
      />
      {errors.length > 0 && (
        <Text id={errorId} size="2" color="red">
          {errors.join(' ')}
        </Text>
      )}
    </Flex>
  );
}
