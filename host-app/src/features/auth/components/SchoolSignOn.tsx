import { Button, Flex, Separator, Text } from '@radix-ui/themes';
import { apiPaths } from '@/api/apiPaths';
import { useAuthConfig } from '../hooks/useAuthConfig';

export interface SchoolSignOnProps {
  /** The in-app path to return to afterwards. */
  next?: string;
}

/**
 * "Sign in with school account", shown only when the server has sign-on set up. A plain link,
 * not a fetch: the browser leaves the app for the school's provider and comes back through the server.
 */
export function SchoolSignOn({ next }: SchoolSignOnProps) {
  const config = useAuthConfig();
  if (!config.data?.signOn) return null;
  return (
    <Flex direction="column" gap="3" align="start">
      <Separator size="4" />
      <Text size="2" color="gray">
        Or use the account your school gave you.
      </Text>
      <Button asChild size="3" variant="soft">
        <a href={apiPaths.signOn(next)}>Sign in with school account</a>
      </Button>
    </Flex>
  );
}
