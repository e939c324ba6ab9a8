import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeMe, makeStaffUser } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const admin = makeMe({ id: 'admin-1', role: 'admin', displayName: 'Idris Haddad' });
const teacher = makeStaffUser({ id: 'teacher-1', displayName: 'Maja Lindqvist' });
const invited = makeStaffUser({ id: 'teacher-2', displayName: 'Tomás Reyes', email: 't.reyes@school.example', activated: false });

describe('AdminStaffPage', () => {
  it('lists staff with a written status and no deactivate button for the admin themself', async () => {
    const adminRow = makeStaffUser({ id: admin.id, displayName: admin.displayName, role: 'admin' });
    stubFetch({ 'GET /api/me': { status: 200, body: admin }, 'GET /api/admin/users': { status: 200, body: [adminRow, teacher, invited] } });
    renderApp(routes.adminStaff.path);

    const invitedRow = (await screen.findByRole('rowheader', { name: 'Tomás Reyes' })).closest('tr')!;
    expect(within(invitedRow).getByText('Invited')).toBeInTheDocument();
    const adminTr = screen.getByRole('rowheader', { name: 'Idris Haddad' }).closest('tr')!;
    expect(within(adminTr).queryByRole('button')).not.toBeInTheDocument();
  });

  it('deactivates a teacher through POST /api/admin/users/:id/deactivate and shows the new status', async () => {
    const fetchMock = stubFetch({
      'GET /api/me': { status: 200, body: admin },
      'GET /api/admin/users': { status: 200, body: [teacher] },
      'POST /api/admin/users/teacher-1/deactivate': { status: 200, body: { ...teacher, active: false } },
    });
    renderApp(routes.adminStaff.path);

    await userEvent.setup().click(await screen.findByRole('button', { name: 'Deactivate Maja Lindqvist' }));

    expect(await screen.findByRole('button', { name: 'Reactivate Maja Lindqvist' })).toBeInTheDocument();
    expect(screen.getByText('Deactivated')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([url, init]) => url === '/api/admin/users/teacher-1/deactivate' && init?.method === 'POST')).toBe(true);
  });

  it('invites a teacher with e-mail and name, then reloads the list', async () => {
    let list = [teacher];
    const fetchMock = stubFetch({
      'GET /api/me': { status: 200, body: admin },
      'GET /api/admin/users': () => ({ status: 200, body: list }),
      'POST /api/admin/users/invitations': () => {
        list = [teacher, invited];
        return { status: 201, body: invited };
      },
    });
    renderApp(routes.adminStaff.path);
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('Name'), 'Tomás Reyes');
    await user.type(screen.getByLabelText('School e-mail'), 't.reyes@school.example');
    await user.click(screen.getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Invitation sent to t.reyes@school.example');
    expect(await screen.findByRole('rowheader', { name: 'Tomás Reyes' })).toBeInTheDocument();
    expect(sentBody(fetchMock, 'POST', '/api/admin/users/invitations')).toEqual({
      email: 't.reyes@school.example',
      displayName: 'Tomás Reyes',
    });
  });
});
