import { Callout } from '@radix-ui/themes';
import { Outlet } from 'react-router-dom';
import { useCurrentUser } from '../hooks/useCurrentUser';

/** Layout route for school-administration pages; the server enforces the same rule. */
export function RequireAdmin() {
  const me = useCurrentUser();
  if (me.role !== 'admin') {
    return (
      <Callout.Root color="gray" role="alert">
        <Callout.Text>This page is for school administrators.</Callout.Text>
      </Callout.Root>
    );
  }
  return <Outlet />;
}
