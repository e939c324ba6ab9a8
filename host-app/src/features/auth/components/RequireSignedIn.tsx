import { Button, Container, Flex } from '@radix-ui/themes';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { routes } from '@/routes';
import { useSignOutStore } from '@/stores/useSignOutStore';
import { useMe } from '../hooks/useMe';
import { CurrentUserContext } from '../utils/CurrentUserContext';

/** Layout route: renders app pages for a signed-in user, sends everyone else to sign-in. */
export function RequireSignedIn() {
  const me = useMe();
  const location = useLocation();
  const signedOut = useSignOutStore((s) => s.signedOut);

  if (me.isPending) return <PageFallback label="Checking your sign-in…" />;
  if (me.isError) {
    return (
      <Container size="2" p="6">
        <Flex direction="column" gap="4" align="start">
          <FormErrorCallout message={me.error.message} />
          <Button onClick={() => void me.refetch()}>Try again</Button>
        </Flex>
      </Container>
    );
  }
  if (!me.data) {
    const here = `${location.pathname}${location.search}`;
    const next = signedOut || here === routes.dashboard.path ? undefined : here;
    return <Navigate to={routes.signIn.build(next)} replace />;
  }
  return (
    <CurrentUserContext.Provider value={me.data}>
      <Outlet />
    </CurrentUserContext.Provider>
  );
}
