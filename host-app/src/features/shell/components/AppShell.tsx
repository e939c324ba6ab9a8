import { Box, Button, Container, Flex, Link as ThemeLink, Separator, Text } from '@radix-ui/themes';
import { Link, NavLink, Outlet } from 'react-router-dom';
import { useCurrentUser } from '@/features/auth/hooks/useCurrentUser';
import { useSignOut } from '@/features/auth/hooks/useSignOut';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { routes } from '@/routes';
import { shellNavItems } from '../utils/shellNavItems';

/** The signed-in frame: top bar with sections, who is signed in, and the page below. */
export function AppShell() {
  const me = useCurrentUser();
  const signOut = useSignOut();

  return (
    <Flex direction="column" minHeight="100vh">
      <a className="skip-link" href="#main">
        Skip to main content
      </a>
      <Box asChild px="5" py="3" className="app-top-bar">
        <header>
          <Flex align="center" justify="between" gap="5" wrap="wrap">
            <Flex align="center" gap="6" wrap="wrap">
              <ThemeLink asChild size="5" weight="bold" underline="none" highContrast>
                <Link to={routes.dashboard.path}>Covalent</Link>
              </ThemeLink>
              <nav aria-label="Main">
                <Flex asChild gap="4" wrap="wrap" m="0" p="0">
                  <ul className="app-nav-list">
                    {shellNavItems(me.role).map((item) => (
                      <li key={item.to}>
                        <ThemeLink asChild size="3">
                          <NavLink to={item.to} className="app-nav-link">
                            {item.label}
                          </NavLink>
                        </ThemeLink>
                      </li>
                    ))}
                  </ul>
                </Flex>
              </nav>
            </Flex>
            <Flex align="center" gap="4">
              <Text size="2" color="gray">
                Signed in as{' '}
                <Text weight="bold" color="gray" highContrast>
                  {me.displayName}
                </Text>
              </Text>
              <Button variant="soft" color="gray" loading={signOut.isPending} onClick={() => signOut.mutate()}>
                Sign out
              </Button>
            </Flex>
          </Flex>
        </header>
      </Box>
      <Separator size="4" />
      <Box asChild flexGrow="1" py="7" px="5">
        <main id="main" tabIndex={-1}>
          <Container size="3">
            <FormErrorCallout message={signOut.error?.message} />
            <Outlet />
          </Container>
        </main>
      </Box>
    </Flex>
  );
}
