import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

describe('ForgotPasswordPage', () => {
  it('posts the e-mail and shows the neutral confirmation on 202', async () => {
    const message = 'If that address has an account, a reset link is on its way.';
    const fetchMock = stubFetch({ 'POST /api/auth/password-reset-requests': { status: 202, body: { ok: true, message } } });
    renderApp(routes.forgotPassword.path);
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'someone@school.example');
    await user.click(screen.getByRole('button', { name: 'Send the link' }));

    expect(await screen.findByRole('status')).toHaveTextContent(message);
    expect(sentBody(fetchMock, 'POST', '/api/auth/password-reset-requests')).toEqual({ email: 'someone@school.example' });
  });
});
