import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';

export interface SectionCardProps {
  title: string;
  description: string;
  to: string;
}

/** A whole-card link to one section of the app. */
export function SectionCard({ title, description, to }: SectionCardProps) {
  return (
    <Card asChild size="3">
      <Link to={to}>
        <Flex direction="column" gap="2">
          <Heading as="h2" size="4">
            {title}
          </Heading>
          <Text color="gray">{description}</Text>
        </Flex>
      </Link>
    </Card>
  );
}
