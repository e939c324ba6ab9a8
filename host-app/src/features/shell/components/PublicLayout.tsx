import { Box, Card, Container, Flex, Text } from '@radix-ui/themes';
import { Outlet } from 'react-router-dom';

/** Frame of the signed-out pages: product name and one centred card. */
export function PublicLayout() {
  return (
    <Box asChild minHeight="100vh" py="9" px="4">
      <main id="main">
        <Container size="1">
          <Flex direction="column" gap="6">
            <Flex direction="column" gap="1">
              <Text as="p" size="6" weight="bold" color="teal">
                Covalent
              </Text>
              <Text color="gray">Team review for the chemistry classroom</Text>
            </Flex>
            <Card size="4">
              <Outlet />
            </Card>
          </Flex>
        </Container>
      </main>
    </Box>
  );
}
