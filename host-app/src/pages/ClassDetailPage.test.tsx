import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { ClassDetailDto } from '@covalent/shared-types';
import { makeClassDetail, makeRosterEntry } from '@/test/authoringFactories';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch, type FetchRoutes } from '@/test/stubFetch';
import { routes } from '@/routes';

const CLASS_ID = 'c1000000-0000-4000-8000-000000000001';

const roster = [
  makeRosterEntry({ displayName: 'Finn W.', tableGroup: '10', seatNumber: 1 }),
  makeRosterEntry({ displayName: 'Zara K.', tableGroup: '2', seatNumber: 2, timeMultiplier: 2 }),
  makeRosterEntry({ displayName: 'Amara O.', tableGroup: '2', seatNumber: 1, timeMultiplier: 1.25 }),
  makeRosterEntry({ displayName: 'Lena P.', tableGroup: null }),
];

function openClass(cls: ClassDetailDto, extra: FetchRoutes = {}) {
  const fetchMock = stubFetch({
    'GET /api/me': { status: 200, body: makeMe() },
    [`GET /api/classes/${CLASS_ID}`]: { status: 200, body: cls },
    ...extra,
  });
  renderApp(routes.classDetail.build(CLASS_ID));
  return { fetchMock, user: userEvent.setup() };
}

describe('ClassDetailPage', () => {
  it('shows the seat map as one card per table, in natural table order, seats ascending', async () => {
    const { user } = openClass(makeClassDetail({ roster }));
    await user.click(await screen.findByRole('tab', { name: /seat map/i }));

    const map = await screen.findByRole('list', { name: 'Seat map' });
    const cards = within(map).getAllByRole('listitem', { name: /table/i });
    expect(cards.map((c) => within(c).getByRole('heading').textContent)).toEqual(['Table 2', 'Table 10', 'No table']);
    const table2 = within(cards[0]).getByRole('list', { name: 'Seats at Table 2' });
    expect(within(table2).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Seat 1Amara O.×1.25 time', 'Seat 2Zara K.×2 time']);
  });

  it('offers exactly the time multipliers 1, 1.25, 1.5 and 2', async () => {
    openClass(makeClassDetail({ roster }));
    const select = await screen.findByLabelText('Time multiplier');
    const values = within(select).getAllByRole('option').map((o) => (o as HTMLOptionElement).value);
    expect(values).toEqual(['1', '1.25', '1.5', '2']);
  });

  it('adds a student with table, seat and extended time as numbers', async () => {
    const added = makeRosterEntry({ displayName: 'Priya S.', tableGroup: '1', seatNumber: 4, timeMultiplier: 1.5 });
    const { fetchMock, user } = openClass(makeClassDetail(), {
      [`POST /api/classes/${CLASS_ID}/roster`]: { status: 201, body: added },
    });
    await user.type(await screen.findByLabelText('Display name'), 'Priya S.');
    await user.type(screen.getByLabelText('Table group'), '1');
    await user.type(screen.getByLabelText('Seat number'), '4');
    await user.selectOptions(screen.getByLabelText('Time multiplier'), '1.5');
    await user.click(screen.getByRole('button', { name: 'Add student' }));

    await screen.findAllByText('No students yet');
    expect(sentBody(fetchMock, 'POST', `/api/classes/${CLASS_ID}/roster`)).toEqual({
      displayName: 'Priya S.',
      tableGroup: '1',
      seatNumber: 4,
      timeMultiplier: 1.5,
    });
  });

  it('edits a row and sends the changed multiplier', async () => {
    const amara = roster[2];
    const { fetchMock, user } = openClass(makeClassDetail({ roster }), {
      [`PATCH /api/classes/${CLASS_ID}/roster/${amara.id}`]: { status: 200, body: { ...amara, timeMultiplier: 2 } },
    });
    await user.click(await screen.findByRole('button', { name: 'Edit Amara O.' }));
    await user.selectOptions(screen.getByLabelText('Time multiplier of Amara O.'), '2');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByRole('button', { name: 'Edit Amara O.' })).toBeInTheDocument();
    expect(sentBody(fetchMock, 'PATCH', `/api/classes/${CLASS_ID}/roster/${amara.id}`)).toMatchObject({ timeMultiplier: 2, seatNumber: 1, tableGroup: '2' });
  });

  it('shows the privacy note beside the roster', async () => {
    openClass(makeClassDetail({ roster }));
    expect(await screen.findByRole('note')).toHaveTextContent(
      'Use first names or the names students go by; no surnames, IDs or e-mail addresses needed.',
    );
  });

  it('adds a keep-apart pair from two chosen students', async () => {
    const [finn, zara] = roster;
    const { fetchMock, user } = openClass(makeClassDetail({ roster }), {
      [`POST /api/classes/${CLASS_ID}/pairs`]: { status: 201, body: { id: 'p1', classId: CLASS_ID, kind: 'apart', entryAId: finn.id, entryBId: zara.id } },
    });
    await user.selectOptions(await screen.findByLabelText('First student'), 'Finn W.');
    await user.selectOptions(screen.getByLabelText('Second student'), 'Zara K.');
    await user.click(screen.getByRole('button', { name: 'Add rule' }));

    await screen.findByRole('button', { name: 'Add rule' });
    expect(sentBody(fetchMock, 'POST', `/api/classes/${CLASS_ID}/pairs`)).toEqual({ kind: 'apart', entryAId: finn.id, entryBId: zara.id });
  });

  it('shows the roster import’s row report and sends the chosen mode', async () => {
    const report = makeApiError('validation_failed', '1 cell needs attention. Nothing was imported.', [
      { field: 'row 4, column time_multiplier', message: '"3" is not one of 1, 1.25, 1.5, 2 (or empty for 1).' },
    ]);
    const { fetchMock, user } = openClass(makeClassDetail({ roster }), {
      [`POST /api/classes/${CLASS_ID}/roster/import`]: { status: 400, body: report },
    });
    await user.click(await screen.findByRole('button', { name: 'Import roster CSV' }));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('radio', { name: /replace the whole roster/i }));
    await user.upload(within(dialog).getByLabelText('CSV file'), new File(['display_name\n'], 'roster.csv', { type: 'text/csv' }));
    await user.click(within(dialog).getByRole('button', { name: 'Import' }));

    const problems = await within(dialog).findByRole('list', { name: 'Problems in the file' });
    expect(within(problems).getByRole('listitem')).toHaveTextContent('Row 4, column time_multiplier: "3" is not one of 1, 1.25, 1.5, 2');
    const [, init] = fetchMock.mock.calls.find(([url]) => url === `/api/classes/${CLASS_ID}/roster/import`)!;
    expect((init?.body as FormData).get('mode')).toBe('replace');
  });

  it('is read-only for a co-teacher', async () => {
    openClass(makeClassDetail({ roster, access: 'co-teacher', ownerName: 'Maja Lindqvist' }));
    expect(await screen.findByText("Maja Lindqvist's class · read only")).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /edit/i })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Import roster CSV' })).not.toBeInTheDocument();
    expect(screen.queryByLabelText('Display name')).not.toBeInTheDocument();
  });

  it('starts a session for this class from its page, for its teachers only', async () => {
    openClass(makeClassDetail({ id: CLASS_ID, roster, access: 'co-teacher' }));
    const link = await screen.findByRole('link', { name: 'New session for this class' });
    expect(link).toHaveAttribute('href', `/sessions/new?classId=${CLASS_ID}`);
  });

  it('offers no session to an admin reading the class', async () => {
    openClass(makeClassDetail({ id: CLASS_ID, roster, access: 'admin' }));
    await screen.findByRole('link', { name: 'Trends by tag' });
    expect(screen.queryByRole('link', { name: 'New session for this class' })).not.toBeInTheDocument();
  });

  it("links each roster row to that student's history, for a co-teacher too", async () => {
    const [finn, zara] = roster;
    openClass(makeClassDetail({ roster, access: 'co-teacher', ownerName: 'Maja Lindqvist' }));
    const link = await screen.findByRole('link', { name: 'History for Finn W.' });
    expect(link).toHaveAttribute('href', routes.studentHistory.build(CLASS_ID, finn.id));
    expect(link).toHaveTextContent(/^History$/);
    const zaraRow = within(screen.getByRole('table', { name: 'Roster' })).getByRole('row', { name: /Zara K\./ });
    expect(within(zaraRow).getByRole('link', { name: 'History for Zara K.' })).toHaveAttribute('href', `/classes/${CLASS_ID}/students/${zara.id}`);
  });
});
