import { Flex, Text } from '@radix-ui/themes';
import { useId, type ReactNode } from 'react';

/** What a control inside a FieldFrame spreads onto itself. */
export interface FieldControlProps {
  id: string;
  'aria-describedby'?: string;
  'aria-invalid'?: true;
}

export interface FieldFrameProps {
  label: string;
  hint?: ReactNode;
  /** Problems with this field, shown under it and tied to the control. */
  errors?: string[];
  children: (control: FieldControlProps) => ReactNode;
}

/** A label, hint and errors around any control (select, text area, number), wired for screen readers. */
export function FieldFrame({ label, hint, errors = [], children }: FieldFrameProps) {
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
      {children({ id, 'aria-describedby': describedBy, ...(errors.length ? { 'aria-invalid': true as const } : {}) })}
      {errors.length > 0 && (
        <Text id={errorId} size="2" color="red">
          {errors.join(' ')}
        </Text>
      )}
    </Flex>
  );
}
