import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe, makeStaffUser } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

async function mainNav() {
  return within(await screen.findByRole('navigation', { name: 'Main' }));
}

describe('AppShell', () => {
  it('shows the four sections and hides Staff for a teacher', async () => {
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe({ role: 'teacher' }) } });
    renderApp(routes.dashboard.path);

    const nav = await mainNav();
    expect(nav.getAllByRole('link').map((a) => a.textContent)).toEqual(['Classes', 'Banks', 'Sessions', 'Debriefs']);
    expect(nav.queryByRole('link', { name: 'Staff' })).not.toBeInTheDocument();
    expect(screen.getByText('Ruth Okafor')).toBeInTheDocument();
  });

  it('shows the Staff link for an admin and it opens the staff list', async () => {
    const admin = makeMe({ role: 'admin', displayName: 'Idris Haddad' });
    stubFetch({
      'GET /api/me': { status: 200, body: admin },
      'GET /api/admin/users': { status: 200, body: [makeStaffUser()] },
    });
    renderApp(routes.dashboard.path);

    const staffLink = (await mainNav()).getByRole('link', { name: 'Staff' });
    expect(staffLink).toHaveAttribute('href', routes.adminStaff.path);
    await userEvent.setup().click(staffLink);
    expect(await screen.findByRole('rowheader', { name: 'Maja Lindqvist' })).toBeInTheDocument();
  });

  it('sends a signed-out visitor (401 from /api/me) to sign-in, remembering the page', async () => {
    stubFetch({ 'GET /api/me': { status: 401, body: makeApiError('unauthenticated', 'Please sign in.') } });
    const { router } = renderApp(routes.banks.path);

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.signIn.path);
    expect(router.state.location.search).toBe('?next=%2Fbanks');
  });

  it('signs out (204) and returns to the sign-in page', async () => {
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, 'POST /api/auth/sign-out': { status: 204 } });
    const { router } = renderApp(routes.classes.path);

    await userEvent.setup().click(await screen.findByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.signIn.path);
    expect(router.state.location.search).toBe('');
    expect(screen.getByRole('status')).toHaveTextContent('You have signed out.');
  });
});
