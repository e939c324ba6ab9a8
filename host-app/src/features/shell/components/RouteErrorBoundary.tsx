import { Button, Callout, Container, Flex, Heading, Link as ThemeLink, Text } from '@radix-ui/themes';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { routes } from '@/routes';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`;
  if (error instanceof Error) return error.message;
  return 'Unknown error';
}

/** The app's one error boundary: a calm message and a way back, never a blank page. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  return (
    <Container size="2" p="6">
      <title>Something went wrong · Covalent</title>
      <Flex direction="column" gap="4" role="alert">
        <Heading as="h1" size="6">
          Something went wrong
        </Heading>
        <Text>This page could not be shown. Your classes, banks and saved sessions are not affected.</Text>
        <Callout.Root color="gray" variant="surface">
          <Callout.Text>
            <Text size="2" color="gray">
              Details: {describe(error)}
            </Text>
          </Callout.Text>
        </Callout.Root>
        <Flex gap="3" align="center">
          <Button size="3" onClick={() => window.location.reload()}>
            Reload the page
          </Button>
          <ThemeLink asChild>
            <Link to={routes.dashboard.path}>Go to the dashboard</Link>
          </ThemeLink>
        </Flex>
      </Flex>
    </Container>
  );
}
