import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';
const NO_SIGN_ON = { 'GET /api/auth/config': { status: 200, body: { signOn: false } } };
const WITH_SIGN_ON = { 'GET /api/auth/config': { status: 200, body: { signOn: true } } };

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInPage', () => {
  it('labels its inputs with the autocomplete hints password managers use', async () => {
    stubFetch(NO_SIGN_ON);
    renderApp(routes.signIn.path);
    expect(await screen.findByLabelText('E-mail')).toHaveAttribute('autocomplete', 'email');
    expect(screen.getByLabelText('Password')).toHaveAttribute('autocomplete', 'current-password');
    expect(screen.getByLabelText('Password')).toHaveAttribute('type', 'password');
  });

  it('signs in and opens the dashboard greeting the teacher on 200', async () => {
    const me = makeMe();
    const fetchMock = stubFetch({
      ...NO_SIGN_ON,
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
    stubFetch({ ...NO_SIGN_ON, 'POST /api/auth/sign-in': { status: 200, body: me }, 'GET /api/me': { status: 200, body: me } });
    const { router } = renderApp(routes.signIn.build(routes.banks.path));

    await fillAndSubmit('r.okafor@school.example', 'a long enough passphrase');

    expect(await screen.findByRole('heading', { level: 1, name: 'Banks' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.banks.path);
  });

  it("shows the server's message verbatim, as an alert, on 401", async () => {
    stubFetch({ ...NO_SIGN_ON, 'POST /api/auth/sign-in': { status: 401, body: makeApiError('invalid_credentials', BAD_CREDENTIALS) } });
    const { router } = renderApp(routes.signIn.path);

    await fillAndSubmit('r.okafor@school.example', 'wrong password here');

    expect(await screen.findByRole('alert')).toHaveTextContent(BAD_CREDENTIALS);
    expect(router.state.location.pathname).toBe(routes.signIn.path);
  });

  describe('school sign-on', () => {
    it('offers "Sign in with school account" as a full-page link to the server when sign-on is set up', async () => {
      stubFetch(WITH_SIGN_ON);
      renderApp(routes.signIn.path);
      const link = await screen.findByRole('link', { name: 'Sign in with school account' });
      expect(link).toHaveAttribute('href', '/api/auth/sign-on');
      // It is a link, so the password form keeps the only "Sign in" button.
      expect(screen.getAllByRole('button', { name: /sign in/i })).toHaveLength(1);
    });

    it('carries ?next= over to the sign-on link, and never an off-site one', async () => {
      stubFetch(WITH_SIGN_ON);
      renderApp(routes.signIn.build(routes.banks.path));
      expect(await screen.findByRole('link', { name: 'Sign in with school account' })).toHaveAttribute('href', '/api/auth/sign-on?next=%2Fbanks');
    });

    it('shows no school sign-on when the server has none', async () => {
      const fetchMock = stubFetch(NO_SIGN_ON);
      renderApp(routes.signIn.path);
      await screen.findByLabelText('E-mail');
      await waitFor(() => expect(fetchMock).toHaveBeenCalledWith('/api/auth/config', expect.anything()));
      await new Promise((resolve) => setTimeout(resolve, 20));
      expect(screen.queryByRole('link', { name: 'Sign in with school account' })).not.toBeInTheDocument();
    });

    it('hides it, and still lets a teacher sign in with a password, when the server cannot say', async () => {
      stubFetch({ 'GET /api/auth/config': { status: 500, body: makeApiError('internal', 'Something went wrong.') } });
      renderApp(routes.signIn.path);
      expect(await screen.findByLabelText('Password')).toBeInTheDocument();
      await new Promise((resolve) => setTimeout(resolve, 20));
      expect(screen.queryByRole('link', { name: 'Sign in with school account' })).not.toBeInTheDocument();
    });

    it('explains a refused sign-on from ?error=, as an alert', async () => {
      stubFetch(WITH_SIGN_ON);
      renderApp('/sign-in?error=no_account');
      expect(await screen.findByRole('alert')).toHaveTextContent(
        'No Covalent account uses that school e-mail. Ask your school admin for an invitation.',
      );
      expect(await screen.findByRole('link', { name: 'Sign in with school account' })).toBeInTheDocument();
    });

    it('explains a deactivated account differently from an unknown one', async () => {
      stubFetch(NO_SIGN_ON);
      renderApp('/sign-in?error=account_deactivated');
      expect(await screen.findByRole('alert')).toHaveTextContent('This Covalent account has been deactivated. Ask your school admin.');
    });

    it('gives a general sentence for a code it does not know, without echoing it', async () => {
      stubFetch(NO_SIGN_ON);
      renderApp('/sign-in?error=%3Cscript%3Ealert(1)%3C%2Fscript%3E');
      const alert = await screen.findByRole('alert');
      expect(alert).toHaveTextContent('School sign-on did not complete. Try again, or sign in with your e-mail and password.');
      expect(alert).not.toHaveTextContent('script');
    });

    it('shows no sign-on alert on a plain visit', async () => {
      stubFetch(NO_SIGN_ON);
      renderApp(routes.signIn.path);
      await screen.findByLabelText('E-mail');
      expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    });
  });
});
