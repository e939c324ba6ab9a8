import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface EmptyStateProps {
  title: string;
  children?: ReactNode;
}

/** A quiet placeholder for a list with nothing in it yet. */
export function EmptyState({ title, children }: EmptyStateProps) {
  return (
    <Card size="4" variant="surface">
      <Flex direction="column" gap="2" align="start">
        <Heading as="h2" size="4">
          {title}
        </Heading>
        {children && <Text color="gray">{children}</Text>}
      </Flex>
    </Card>
  );
}
