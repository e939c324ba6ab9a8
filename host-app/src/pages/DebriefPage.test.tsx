import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { DebriefDto } from '@covalent/shared-types';
import {
  CATCHUP_ID,
  SESSION_ID,
  fig,
  makeCatchupCard,
  makeCatchupResults,
  makeCatchupStudentResult,
  makeCatchupSummary,
  makeDebrief,
  makeDebriefItem,
  makeDebriefStudent,
  makeDeletePlayerData,
  makeMissedItem,
  noFig,
} from '@/features/debrief/testing/debriefFactories';
import { formatDateTime } from '@/features/debrief/utils/formatDate';
import { routes } from '@/routes';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { callsTo, stubFetch } from '@/test/stubFetch';

const debriefUrl = `/api/sessions/${SESSION_ID}/debrief`;
const catchupsUrl = `/api/sessions/${SESSION_ID}/catchups`;
const closeUrl = `/api/sessions/${SESSION_ID}/catchups/${CATCHUP_ID}/close`;
const KRYPTON_ID = '7c1e0a00-0000-4000-8000-0000000000p2';
const kryptonDataUrl = `/api/sessions/${SESSION_ID}/players/${KRYPTON_ID}/data`;

function renderDebrief(debrief: DebriefDto, extra: Parameters<typeof stubFetch>[0] = {}) {
  const fetchMock = stubFetch({
    'GET /api/me': { status: 200, body: makeMe() },
    [`GET ${debriefUrl}`]: { status: 200, body: debrief },
    [`GET ${catchupsUrl}`]: { status: 200, body: [] },
    ...extra,
  });
  const view = renderApp(routes.debrief.build(SESSION_ID));
  return { ...view, fetchMock };
}

const threeItems = [
  makeDebriefItem({ id: 'i1', position: 0, prompt: 'First item', p: fig(0.55), D: fig(0.1), flags: ['weak'] }),
  makeDebriefItem({ id: 'i2', position: 1, prompt: 'Second item', p: fig(0.2), D: fig(-0.15), flags: ['hard', 'weak', 'possibleMiskey'] }),
  makeDebriefItem({ id: 'i3', position: 2, prompt: 'Third item', p: fig(0.95), D: fig(0.45), flags: ['easy'] }),
];

async function itemRowPrompts(): Promise<string[]> {
  const table = await screen.findByRole('table', { name: 'Item analysis' });
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getByRole('rowheader').textContent ?? '');
}

describe('DebriefPage', () => {
  it('sorts the item table by p and by D, toggling direction on a second click', async () => {
    const user = userEvent.setup();
    renderDebrief(makeDebrief({ items: threeItems }));
    expect(await itemRowPrompts()).toEqual(['First item', 'Second item', 'Third item']);

    await user.click(screen.getByRole('button', { name: 'p' }));
    expect(await itemRowPrompts()).toEqual(['Third item', 'First item', 'Second item']);
    expect(screen.getByRole('columnheader', { name: 'p' })).toHaveAttribute('aria-sort', 'descending');
    await user.click(screen.getByRole('button', { name: 'p' }));
    expect(await itemRowPrompts()).toEqual(['Second item', 'First item', 'Third item']);

    await user.click(screen.getByRole('button', { name: 'D' }));
    expect(await itemRowPrompts()).toEqual(['Third item', 'First item', 'Second item']);
    await user.click(screen.getByRole('button', { name: 'D' }));
    expect(await itemRowPrompts()).toEqual(['Second item', 'First item', 'Third item']);
  });

  it('shows the flags as words and links each item to its analysis', async () => {
    renderDebrief(makeDebrief({ items: threeItems }));
    const table = await screen.findByRole('table', { name: 'Item analysis' });
    const second = within(table).getByRole('row', { name: /Second item/ });
    expect(second).toHaveTextContent('hard');
    expect(second).toHaveTextContent('weak');
    expect(second).toHaveTextContent('possible mis-key');
    expect(within(table).getByRole('row', { name: /Third item/ })).toHaveTextContent('easy');
    expect(within(table).getByRole('link', { name: 'Second item' })).toHaveAttribute('href', routes.debriefItem.build(SESSION_ID, 'i2'));
  });

  it('shows "not enough data" with the reason when the reliability or an item figure is null', async () => {
    renderDebrief(
      makeDebrief({
        reliability: { method: 'kr20', value: noFig('needs at least 2 items answered'), sem: noFig('no reliability'), excludedItemIds: [] },
        items: [makeDebriefItem({ prompt: 'Lonely item', pointBiserial: noFig('no variance in rest score') })],
      }),
    );
    expect(await screen.findByText('(needs at least 2 items answered)')).toBeInTheDocument();
    const itemRow = within(screen.getByRole('table', { name: 'Item analysis' })).getByRole('row', { name: /Lonely item/ });
    expect(within(itemRow).getByText('not enough data')).toHaveAttribute('title', 'no variance in rest score');
    expect(screen.getByText('Reliability (KR-20)')).toBeInTheDocument();
  });

  it('lists each student’s missed items with their answer beside the key', async () => {
    renderDebrief(
      makeDebrief({
        students: [
          makeDebriefStudent({
            rosterName: 'Amal Haddad',
            score: 1,
            percent: fig(100 / 3),
            missed: [
              makeMissedItem({ position: 1, prompt: 'Pick the pipette', answerText: 'A. Beaker', keyText: 'B. Volumetric pipette' }),
              makeMissedItem({ itemId: 'i9', position: 2, prompt: 'Rinse order', answered: false, answer: null, answerText: '' }),
            ],
          }),
        ],
      }),
    );
    const table = await screen.findByRole('table', { name: 'Students' });
    const row = within(table).getByRole('row', { name: /Amal Haddad/ });
    expect(row).toHaveTextContent('1.00');
    expect(row).toHaveTextContent('33.3%');
    // One line per missed item first; the switch adds the student's answer beside the key.
    const missed = () => within(within(table).getByRole('row', { name: /Amal Haddad/ })).getAllByRole('listitem');
    expect(missed()[0]).toHaveTextContent(/^Item 2 Pick the pipette$/);
    expect(missed()[1]).toHaveTextContent(/^Item 3 Rinse order \(not answered\)$/);
    await userEvent.setup().click(screen.getByRole('switch', { name: 'Show each answer beside the key' }));
    expect(missed()[0]).toHaveTextContent('Item 2 Pick the pipette');
    expect(missed()[0]).toHaveTextContent('Answer: A. Beaker · Key: B. Volumetric pipette');
    expect(missed()[1]).toHaveTextContent('Answer: not answered · Key: B. Volumetric pipette');
  });

  it('shows team points, accuracy and unity rate', async () => {
    renderDebrief(makeDebrief());
    const table = await screen.findByRole('table', { name: 'Teams' });
    const row = within(table).getByRole('row', { name: /Team Neon/ });
    expect(row).toHaveTextContent('1800');
    expect(row).toHaveTextContent('75.0%');
    expect(row).toHaveTextContent('50.0%');
  });

  it('links both CSV downloads to the session’s export URLs', async () => {
    renderDebrief(makeDebrief());
    const gradebook = await screen.findByRole('link', { name: 'Download gradebook (CSV)' });
    expect(gradebook).toHaveAttribute('href', `/api/sessions/${SESSION_ID}/exports/gradebook.csv`);
    expect(gradebook).toHaveAttribute('download');
    const analysis = screen.getByRole('link', { name: 'Download item analysis (CSV)' });
    expect(analysis).toHaveAttribute('href', `/api/sessions/${SESSION_ID}/exports/item-analysis.csv`);
    expect(analysis).toHaveAttribute('download');
  });

  it('posts the e-mail request and shows who it was sent to', async () => {
    const user = userEvent.setup();
    const emailUrl = `/api/sessions/${SESSION_ID}/debrief/email`;
    const { fetchMock } = renderDebrief(makeDebrief(), {
      [`POST ${emailUrl}`]: { status: 200, body: { ok: true, recipients: ['r.okafor@school.example', 'm.lindqvist@school.example'] } },
    });
    await user.click(await screen.findByRole('button', { name: 'Send to me and co-teachers' }));
    expect(await screen.findByText('Debrief sent to r.okafor@school.example, m.lindqvist@school.example.')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([url, init]) => url === emailUrl && init?.method === 'POST')).toBe(true);
  });

  it('shows the server’s message when the e-mail fails', async () => {
    const user = userEvent.setup();
    renderDebrief(makeDebrief(), {
      [`POST /api/sessions/${SESSION_ID}/debrief/email`]: { status: 503, body: makeApiError('mail_unavailable', 'Mail is not configured.') },
    });
    await user.click(await screen.findByRole('button', { name: 'Send to me and co-teachers' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Mail is not configured.');
  });

  it('explains that a live session has no debrief yet', async () => {
    stubFetch({
      'GET /api/me': { status: 200, body: makeMe() },
      [`GET ${debriefUrl}`]: { status: 409, body: makeApiError('session_not_ended', 'The session has not ended.') },
    });
    renderApp(routes.debrief.build(SESSION_ID));
    expect(await screen.findByRole('alert')).toHaveTextContent('This session is still live.');
    expect(screen.getByRole('link', { name: 'Open host screen' })).toHaveAttribute('href', routes.hostSession.build(SESSION_ID));
  });
});

const calls = (fetchMock: ReturnType<typeof stubFetch>, method: string, url: string) =>
  fetchMock.mock.calls.filter(([input, init]) => input === url && (init?.method ?? 'GET') === method).length;

async function catchupRow(code: string) {
  const table = await screen.findByRole('table', { name: 'Catch-ups of this session' });
  return within(table).getByRole('row', { name: new RegExp(code) });
}

describe('DebriefPage catch-ups', () => {
  const closedOne = makeCatchupSummary({
    id: 'c-2',
    code: 'RT4WQZ',
    closedAt: '2025-03-10T08:00:00.000Z',
    startedCount: 0,
    clearedCount: 0,
    boxCounts: [20, 0, 0, 0, 0],
    attempts: 0,
    correctAttempts: 0,
    accuracy: noFig('No catch-up answers yet.'),
  });

  it('lists each catch-up with its progress, accuracy and box counts; only an open one can be closed', async () => {
    renderDebrief(makeDebrief(), { [`GET ${catchupsUrl}`]: { status: 200, body: [makeCatchupSummary(), closedOne] } });
    const open = await catchupRow('KX7P2M');
    expect(open).toHaveTextContent('open');
    expect(open).toHaveTextContent('5 of 12');
    expect(open).toHaveTextContent('7 of 20');
    expect(open).toHaveTextContent('62.5%');
    expect(open).toHaveTextContent('Box 1: 13 · Box 2: 5 · Box 3: 2 · Box 4: 0 · Box 5: 0');
    expect(within(open).getByRole('button', { name: 'Close catch-up KX7P2M' })).toBeInTheDocument();

    const closed = await catchupRow('RT4WQZ');
    expect(closed).toHaveTextContent('closed');
    expect(within(closed).getByText('not enough data')).toHaveAttribute('title', 'No catch-up answers yet.');
    expect(within(closed).queryByRole('button', { name: /Close catch-up/ })).toBeNull();
    expect(screen.getByRole('heading', { level: 2, name: 'Catch-ups' }).closest('.debrief-no-print')).not.toBeNull();
  });

  it('says so when the session has no catch-ups', async () => {
    renderDebrief(makeDebrief());
    expect(await screen.findByText('No catch-ups from this session yet.')).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Catch-ups of this session' })).toBeNull();
  });

  it('shows one row per student and card when the results are opened, and hides them again', async () => {
    const user = userEvent.setup();
    const results = makeCatchupResults({
      students: [
        makeCatchupStudentResult({
          rosterEntryId: 'e2',
          displayName: 'Noor B.',
          items: [makeCatchupCard({ prompt: 'Rinse order', box: 2, attempts: 1, correctAttempts: 1, lastCorrect: true, dueAt: '2025-03-07T10:00:00.000Z' })],
        }),
        makeCatchupStudentResult({
          displayName: 'Amal H.',
          items: [
            makeCatchupCard({ prompt: 'Pick the pipette', attempts: 2, lastCorrect: false }),
            makeCatchupCard({ itemId: 'i2', prompt: 'Goggles on when?' }),
          ],
        }),
      ],
    });
    const { fetchMock } = renderDebrief(makeDebrief(), {
      [`GET ${catchupsUrl}`]: { status: 200, body: [makeCatchupSummary()] },
      [`GET /api/sessions/${SESSION_ID}/catchups/${CATCHUP_ID}/results`]: { status: 200, body: results },
    });
    const toggle = await screen.findByRole('button', { name: 'Results for catch-up KX7P2M' });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await user.click(toggle);

    const table = await screen.findByRole('table', { name: 'Catch-up results KX7P2M' });
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(screen.getByRole('heading', { name: 'Catch-up results KX7P2M' })).toBeInTheDocument();
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getByRole('rowheader').textContent)).toEqual(['Amal H.', 'Amal H.', 'Noor B.']);
    expect(within(rows[0]).getAllByRole('cell').map((c) => c.textContent)).toEqual(['Pick the pipette', '1', '2', '0', 'wrong', formatDateTime('2025-03-05T10:00:00.000Z')]);
    expect(rows[1]).toHaveTextContent('not yet');
    expect(within(rows[2]).getAllByRole('cell').map((c) => c.textContent)).toEqual(['Rinse order', '2', '1', '1', 'right', formatDateTime('2025-03-07T10:00:00.000Z')]);

    await user.click(toggle);
    expect(screen.queryByRole('table', { name: 'Catch-up results KX7P2M' })).toBeNull();
    expect(calls(fetchMock, 'GET', `/api/sessions/${SESSION_ID}/catchups/${CATCHUP_ID}/results`)).toBe(1);
  });

  it('closes a catch-up only after the teacher confirms, then refetches the list', async () => {
    const user = userEvent.setup();
    let current = makeCatchupSummary();
    const fetchMock = renderDebrief(makeDebrief(), {
      [`GET ${catchupsUrl}`]: () => ({ status: 200, body: [current] }),
      [`POST ${closeUrl}`]: () => {
        current = { ...current, closedAt: '2025-03-06T08:00:00.000Z' };
        return { status: 200, body: current };
      },
    }).fetchMock;

    await user.click(await screen.findByRole('button', { name: 'Close catch-up KX7P2M' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(dialog).toHaveTextContent('Close catch-up KX7P2M?');
    expect(calls(fetchMock, 'POST', closeUrl)).toBe(0);
    await user.click(within(dialog).getByRole('button', { name: 'Close catch-up' }));

    await waitFor(() => expect(screen.queryByRole('button', { name: 'Close catch-up KX7P2M' })).toBeNull());
    expect(await catchupRow('KX7P2M')).toHaveTextContent('closed');
    expect(calls(fetchMock, 'POST', closeUrl)).toBe(1);
    expect(calls(fetchMock, 'GET', catchupsUrl)).toBe(2);
  });

  it("shows the server's message when closing fails, and keeps the catch-up open", async () => {
    const user = userEvent.setup();
    renderDebrief(makeDebrief(), {
      [`GET ${catchupsUrl}`]: { status: 200, body: [makeCatchupSummary()] },
      [`POST ${closeUrl}`]: { status: 403, body: makeApiError('forbidden', 'Only the class owner can close this catch-up.') },
    });
    await user.click(await screen.findByRole('button', { name: 'Close catch-up KX7P2M' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Close catch-up' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Only the class owner can close this catch-up.');
    expect(await catchupRow('KX7P2M')).toHaveTextContent('open');
  });

  it('lists a newly created catch-up without a reload', async () => {
    const user = userEvent.setup();
    let list: ReturnType<typeof makeCatchupSummary>[] = [];
    renderDebrief(makeDebrief(), {
      [`GET ${catchupsUrl}`]: () => ({ status: 200, body: list }),
      [`POST ${catchupsUrl}`]: () => {
        list = [makeCatchupSummary({ code: 'NEW7QZ' })];
        return { status: 201, body: { id: CATCHUP_ID, code: 'NEW7QZ', cardCount: 20 } };
      },
    });
    expect(await screen.findByText('No catch-ups from this session yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Create catch-up' }));
    expect(await catchupRow('NEW7QZ')).toHaveTextContent('7 of 20');
    expect(screen.queryByText('No catch-ups from this session yet.')).toBeNull();
  });
});

describe("DebriefPage deleting one player's data", () => {
  const amal = makeDebriefStudent({ rosterName: 'Amal Haddad' });
  const krypton = makeDebriefStudent({ playerId: KRYPTON_ID, nickname: 'Krypton', rosterName: null });

  it('asks first, then sends one DELETE for that player and shows the refetched debrief', async () => {
    const user = userEvent.setup();
    let deleted = false;
    const { fetchMock } = renderDebrief(makeDebrief(), {
      [`GET ${debriefUrl}`]: () => ({
        status: 200,
        body: makeDebrief({
          removedCount: deleted ? 1 : 0,
          students: [amal, deleted ? { ...krypton, nickname: 'Removed student', score: null, removed: true } : krypton],
        }),
      }),
      [`DELETE ${kryptonDataUrl}`]: () => {
        deleted = true;
        return { status: 200, body: makeDeletePlayerData(2) };
      },
    });

    const button = await screen.findByRole('button', { name: 'Delete data of Krypton' });
    expect(button).toHaveTextContent('Delete data');
    expect(button.closest('.debrief-no-print')).not.toBeNull();
    await user.click(button);
    const dialog = await screen.findByRole('alertdialog', { name: "Delete Krypton's data from this session?" });
    expect(dialog).toHaveTextContent('The debrief counts them as removed. This cannot be undone.');
    expect(callsTo(fetchMock, 'DELETE', kryptonDataUrl)).toHaveLength(0);

    await user.click(within(dialog).getByRole('button', { name: 'Delete data' }));

    const students = screen.getByRole('heading', { level: 2, name: 'Students' }).closest('section')!;
    const status = await within(students).findByRole('status');
    expect(status).toHaveTextContent("Deleted Krypton's data from this session: 2 responses.");
    // The button that was focused went with its row; focus moves to the status (WCAG 2.4.3 focus order).
    await waitFor(() => expect(status).toHaveFocus());
    const table = screen.getByRole('table', { name: 'Students' });
    expect(await within(table).findByRole('row', { name: /Removed student/ })).toHaveTextContent('Data removed; in no figure.');
    expect(screen.queryByRole('button', { name: 'Delete data of Krypton' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Delete data of Amal Haddad' })).toBeInTheDocument();
    expect(callsTo(fetchMock, 'DELETE', kryptonDataUrl)).toHaveLength(1);
    expect(fetchMock.mock.calls.filter(([, init]) => (init?.method ?? 'GET') === 'DELETE')).toHaveLength(1);
    expect(callsTo(fetchMock, 'GET', debriefUrl)).toHaveLength(2);
  });

  it("shows the server's message when the deletion fails", async () => {
    const user = userEvent.setup();
    renderDebrief(makeDebrief({ students: [krypton] }), {
      [`DELETE ${kryptonDataUrl}`]: { status: 409, body: makeApiError('session_not_ended', "A student's data can be deleted once the session has ended.") },
    });
    await user.click(await screen.findByRole('button', { name: 'Delete data of Krypton' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete data' }));
    expect(await screen.findByRole('alert')).toHaveTextContent("A student's data can be deleted once the session has ended.");
    expect(screen.getByRole('button', { name: 'Delete data of Krypton' })).toBeInTheDocument();
  });

  it('offers no action for a student whose data is already removed, and keeps the action column out of print', async () => {
    renderDebrief(makeDebrief({ students: [amal, { ...krypton, nickname: 'Removed student', score: null, removed: true }] }));
    const table = await screen.findByRole('table', { name: 'Students' });
    const removedRow = within(table).getByRole('row', { name: /Removed student/ });
    expect(removedRow).toHaveTextContent('Data removed; in no figure.');
    expect(within(removedRow).queryByRole('button')).toBeNull();
    expect(within(table).getAllByRole('button', { name: /^Delete data of / })).toHaveLength(1);
    expect(within(table).getByRole('columnheader', { name: 'Actions' })).toHaveClass('debrief-no-print');
  });
});
