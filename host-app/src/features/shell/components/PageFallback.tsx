import { Flex, Spinner, Text } from '@radix-ui/themes';

export interface PageFallbackProps {
  label?: string;
}

/** Shown while a page's code or the signed-in user is loading. */
export function PageFallback({ label = 'Loading…' }: PageFallbackProps) {
  return (
    <Flex role="status" align="center" justify="center" gap="3" p="9">
      <Spinner size="3" />
      <Text color="gray">{label}</Text>
    </Flex>
  );
}
