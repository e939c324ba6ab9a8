import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface PageHeaderProps {
  title: string;
  description?: ReactNode;
}

/** The page's one h1 and a line about what it is for; also sets the document title. */
export function PageHeader({ title, description }: PageHeaderProps) {
  return (
    <Flex direction="column" gap="2" mb="6">
      <title>{`${title} · Covalent`}</title>
      <Heading as="h1" size="7">
        {title}
      </Heading>
      {description && (
        <Text as="p" size="3" color="gray">
          {description}
        </Text>
      )}
    </Flex>
  );
}
