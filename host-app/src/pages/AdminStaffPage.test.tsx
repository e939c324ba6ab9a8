import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeApiError, makeMe, makeSchoolSettings, makeStaffUser } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { callsTo, sentBody, stubFetch, type FetchRoutes } from '@/test/stubFetch';
import { routes } from '@/routes';

const admin = makeMe({ id: 'admin-1', role: 'admin', displayName: 'Idris Haddad' });
const teacher = makeStaffUser({ id: 'teacher-1', displayName: 'Maja Lindqvist' });
const invited = makeStaffUser({ id: 'teacher-2', displayName: 'Tomás Reyes', email: 't.reyes@school.example', activated: false });

/** The admin, the staff list and the school's settings, plus what a test is about. */
function openStaffPage(extra: FetchRoutes = {}) {
  const fetchMock = stubFetch({
    'GET /api/me': { status: 200, body: admin },
    'GET /api/admin/users': { status: 200, body: [teacher] },
    'GET /api/admin/school': { status: 200, body: makeSchoolSettings({ retentionDays: 365 }) },
    ...extra,
  });
  renderApp(routes.adminStaff.path);
  return fetchMock;
}

const playerDataCard = async () => (await screen.findByRole('heading', { level: 2, name: 'Player data' })).closest('section')!;

describe('AdminStaffPage', () => {
  it('lists staff with a written status and no deactivate button for the admin themself', async () => {
    const adminRow = makeStaffUser({ id: admin.id, displayName: admin.displayName, role: 'admin' });
    openStaffPage({ 'GET /api/admin/users': { status: 200, body: [adminRow, teacher, invited] } });

    const invitedRow = (await screen.findByRole('rowheader', { name: 'Tomás Reyes' })).closest('tr')!;
    expect(within(invitedRow).getByText('Invited')).toBeInTheDocument();
    const adminTr = screen.getByRole('rowheader', { name: 'Idris Haddad' }).closest('tr')!;
    expect(within(adminTr).queryByRole('button')).not.toBeInTheDocument();
  });

  it('deactivates a teacher through POST /api/admin/users/:id/deactivate and shows the new status', async () => {
    const fetchMock = openStaffPage({
      'POST /api/admin/users/teacher-1/deactivate': { status: 200, body: { ...teacher, active: false } },
    });

    await userEvent.setup().click(await screen.findByRole('button', { name: 'Deactivate Maja Lindqvist' }));

    expect(await screen.findByRole('button', { name: 'Reactivate Maja Lindqvist' })).toBeInTheDocument();
    expect(screen.getByText('Deactivated')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([url, init]) => url === '/api/admin/users/teacher-1/deactivate' && init?.method === 'POST')).toBe(true);
  });

  it('invites a teacher with e-mail and name, then reloads the list', async () => {
    let list = [teacher];
    const fetchMock = openStaffPage({
      'GET /api/admin/users': () => ({ status: 200, body: list }),
      'POST /api/admin/users/invitations': () => {
        list = [teacher, invited];
        return { status: 201, body: invited };
      },
    });
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

  describe('player data retention', () => {
    it("shows how long the school keeps player data, with the value in the field and the caution", async () => {
      openStaffPage();
      const card = await playerDataCard();
      expect(await within(card).findByText(/Player data is kept for 365 days after a session ends/)).toBeInTheDocument();
      const field = within(card).getByLabelText('Days to keep player data');
      expect(field).toHaveValue(365);
      expect(field).toHaveAttribute('min', '1');
      expect(field).toHaveAttribute('max', '3650');
      expect(card).toHaveTextContent("Follow your school's policy and the student-privacy law that applies to you. Deletion is permanent");
    });

    it('saves the number through PATCH /api/admin/school and says what was saved', async () => {
      const fetchMock = openStaffPage({
        'PATCH /api/admin/school': (body) => ({ status: 200, body: makeSchoolSettings(body as { retentionDays: number }) }),
      });
      const user = userEvent.setup();
      const card = await playerDataCard();
      const field = await within(card).findByLabelText('Days to keep player data');

      await user.clear(field);
      await user.type(field, '30');
      await user.click(within(card).getByRole('button', { name: 'Save' }));

      expect(await within(card).findByRole('status')).toHaveTextContent('Saved: player data is kept for 30 days.');
      expect(sentBody(fetchMock, 'PATCH', '/api/admin/school')).toEqual({ retentionDays: 30 });
      expect(callsTo(fetchMock, 'PATCH', '/api/admin/school')).toHaveLength(1);
      expect(within(card).getByText(/Player data is kept for 30 days after a session ends/)).toBeInTheDocument();
    });

    it.each(['0', '3651', '2.5'])('refuses %s on the page without sending anything', async (value) => {
      const fetchMock = openStaffPage();
      const user = userEvent.setup();
      const card = await playerDataCard();
      const field = await within(card).findByLabelText('Days to keep player data');

      await user.clear(field);
      await user.type(field, value);
      await user.click(within(card).getByRole('button', { name: 'Save' }));

      expect(within(card).getByText('Enter a whole number of days from 1 to 3650.')).toBeInTheDocument();
      expect(field).toHaveAttribute('aria-invalid', 'true');
      expect(within(card).queryByRole('status')).not.toBeInTheDocument();
      expect(callsTo(fetchMock, 'PATCH', '/api/admin/school')).toHaveLength(0);
    });

    it("shows the server's message and field error when it refuses", async () => {
      openStaffPage({
        'PATCH /api/admin/school': {
          status: 400,
          body: makeApiError('validation_failed', 'Some fields need attention.', [
            { field: 'retentionDays', message: 'retentionDays must be an integer number' },
          ]),
        },
      });
      const user = userEvent.setup();
      const card = await playerDataCard();
      const field = await within(card).findByLabelText('Days to keep player data');

      await user.clear(field);
      await user.type(field, '90');
      await user.click(within(card).getByRole('button', { name: 'Save' }));

      expect(await within(card).findByRole('alert')).toHaveTextContent('Some fields need attention.');
      expect(within(card).getByText('retentionDays must be an integer number')).toBeInTheDocument();
      expect(field).toHaveAttribute('aria-invalid', 'true');
      expect(within(card).queryByRole('status')).not.toBeInTheDocument();
    });
  });
});
