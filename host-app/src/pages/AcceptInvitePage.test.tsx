import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const PASSPHRASE = 'burettes read at the meniscus';

describe('AcceptInvitePage', () => {
  it('sends token and password, leaves out a blank name, and opens the dashboard', async () => {
    const me = makeMe();
    const fetchMock = stubFetch({
      'POST /api/auth/invitations/accept': { status: 200, body: me },
      'GET /api/me': { status: 200, body: me },
    });
    renderApp(routes.acceptInvite.build('inv-7'));
    const user = userEvent.setup();

    expect(await screen.findByLabelText('New password')).toHaveAttribute('autocomplete', 'new-password');
    await user.type(screen.getByLabelText('New password'), PASSPHRASE);
    await user.type(screen.getByLabelText('Confirm new password'), PASSPHRASE);
    await user.click(screen.getByRole('button', { name: 'Create my account' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Hello, Ruth Okafor' })).toBeInTheDocument();
    expect(sentBody(fetchMock, 'POST', '/api/auth/invitations/accept')).toEqual({ token: 'inv-7', password: PASSPHRASE });
  });

  it('shows link_used from the server', async () => {
    stubFetch({
      'POST /api/auth/invitations/accept': {
        status: 410,
        body: makeApiError('link_used', 'This link has already been used. Ask for a new one.'),
      },
    });
    renderApp(routes.acceptInvite.build('inv-7'));
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('New password'), PASSPHRASE);
    await user.type(screen.getByLabelText('Confirm new password'), PASSPHRASE);
    await user.click(screen.getByRole('button', { name: 'Create my account' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('This link has already been used.');
  });
});
