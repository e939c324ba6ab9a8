import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const PASSPHRASE = 'copper sulfate turns blue';

async function choosePassword(password: string, confirm = password) {
  const user = userEvent.setup();
  await user.type(await screen.findByLabelText('New password'), password);
  await user.type(screen.getByLabelText('Confirm new password'), confirm);
  await user.click(screen.getByRole('button', { name: 'Save the new password' }));
}

describe('ResetPasswordPage', () => {
  it('shows the link_expired message and offers a new link', async () => {
    const expired = makeApiError('link_expired', 'This link has expired. Ask for a new one.');
    const fetchMock = stubFetch({ 'POST /api/auth/password-reset': { status: 410, body: expired } });
    renderApp(routes.resetPassword.build('tok-123'));

    await choosePassword(PASSPHRASE);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This link has expired. Ask for a new one.');
    expect(screen.getByRole('link', { name: 'Request a new reset link' })).toHaveAttribute(
      'href',
      routes.forgotPassword.path,
    );
    expect(sentBody(fetchMock, 'POST', '/api/auth/password-reset')).toEqual({ token: 'tok-123', password: PASSPHRASE });
  });

  it("puts weak_password details next to the password field", async () => {
    const weak = makeApiError('weak_password', 'Use at least 15 characters; a few words make a good passphrase.', [
      { field: 'password', message: 'Use at least 15 characters; a few words make a good passphrase.' },
    ]);
    stubFetch({ 'POST /api/auth/password-reset': { status: 400, body: weak } });
    renderApp(routes.resetPassword.build('tok-123'));

    await choosePassword('short');

    await screen.findByRole('alert');
    const input = screen.getByLabelText('New password');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input).toHaveAccessibleDescription(/Use at least 15 characters; a few words/);
  });

  it('does not send mismatched passwords', async () => {
    const fetchMock = stubFetch({});
    renderApp(routes.resetPassword.build('tok-123'));

    await choosePassword(PASSPHRASE, `${PASSPHRASE}!`);

    expect(await screen.findByRole('alert')).toHaveTextContent('The two passwords are not the same.');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('signs the user in and opens the dashboard on 200', async () => {
    const me = makeMe();
    stubFetch({ 'POST /api/auth/password-reset': { status: 200, body: me }, 'GET /api/me': { status: 200, body: me } });
    const { router } = renderApp(routes.resetPassword.build('tok-123'));

    await choosePassword(PASSPHRASE);

    expect(await screen.findByRole('heading', { level: 1, name: 'Hello, Ruth Okafor' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.dashboard.path);
  });
});
