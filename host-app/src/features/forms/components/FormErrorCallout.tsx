import { Callout } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface FormErrorCalloutProps {
  /** The sentence to announce; nothing renders without it. */
  message?: string;
  children?: ReactNode;
}

/** An error announced by screen readers as soon as it appears. */
export function FormErrorCallout({ message, children }: FormErrorCalloutProps) {
  if (!message) return null;
  return (
    <Callout.Root color="red" role="alert" variant="surface">
      <Callout.Text>
        {message}
        {children ? <> {children}</> : null}
      </Callout.Text>
    </Callout.Root>
  );
}
