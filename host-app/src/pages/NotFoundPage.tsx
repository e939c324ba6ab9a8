import { Container, Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';

export function NotFoundPage() {
  return (
    <main id="main">
      <Container size="2" p="6">
        <title>Page not found · Covalent</title>
        <Flex direction="column" gap="4" align="start">
          <Heading as="h1" size="6">
            Page not found
          </Heading>
          <Text>There is no page at this address. It may have moved, or the link may be incomplete.</Text>
          <ThemeLink asChild>
            <Link to={routes.dashboard.path}>Go to the dashboard</Link>
          </ThemeLink>
        </Flex>
      </Container>
    </main>
  );
}
