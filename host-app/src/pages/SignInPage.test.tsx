import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInPage', () => {
  it('labels its inputs with the autocomplete hints password managers use', async () => {
    stubFetch({});
    renderApp(routes.signIn.path);
    expect(await screen.findByLabelText('E-mail')).toHaveAttribute('autocomplete', 'email');
    expect(screen.getByLabelText('Password')).toHaveAttribute('autocomplete', 'current-password');
    expect(screen.getByLabelText('Password')).toHaveAttribute('type', 'password');
  });

  it('signs in and opens the dashboard greeting the teacher on 200', async () => {
    const me = makeMe();
    const fetchMock = stubFetch({
      'POST /api/auth/sign-in': { status: 200, body: me },
      'GET /api/me': { status: 200, body: me },
    });
    const { router } = renderApp(routes.signIn.path);

    await fillAndSubmit('  r.okafor@school.example ', 'a long enough passphrase');

    expect(await screen.findByRole('heading', { level: 1, name: 'Hello, Ruth Okafor' })).toBeInTheDocument();
    expect(screen.getByText('Northfield High School')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.dashboard.path);
    expect(sentBody(fetchMock, 'POST', '/api/auth/sign-in')).toEqual({
      email: 'r.okafor@school.example',
      password: 'a long enough passphrase',
    });
  });

  it('returns to the page named in ?next= after signing in', async () => {
    const me = makeMe();
    stubFetch({ 'POST /api/auth/sign-in': { status: 200, body: me }, 'GET /api/me': { status: 200, body: me } });
    const { router } = renderApp(routes.signIn.build(routes.banks.path));

    await fillAndSubmit('r.okafor@school.example', 'a long enough passphrase');

    expect(await screen.findByRole('heading', { level: 1, name: 'Banks' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.banks.path);
  });

  it("shows the server's message verbatim, as an alert, on 401", async () => {
    stubFetch({ 'POST /api/auth/sign-in': { status: 401, body: makeApiError('invalid_credentials', BAD_CREDENTIALS) } });
    const { router } = renderApp(routes.signIn.path);

    await fillAndSubmit('r.okafor@school.example', 'wrong password here');

    expect(await screen.findByRole('alert')).toHaveTextContent(BAD_CREDENTIALS);
    expect(router.state.location.pathname).toBe(routes.signIn.path);
  });
});
