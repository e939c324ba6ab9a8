import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { DebriefDto } from '@covalent/shared-types';
import {
  SESSION_ID,
  fig,
  makeDebrief,
  makeDebriefItem,
  makeDebriefStudent,
  makeMissedItem,
  noFig,
} from '@/features/debrief/testing/debriefFactories';
import { routes } from '@/routes';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

const debriefUrl = `/api/sessions/${SESSION_ID}/debrief`;

function renderDebrief(debrief: DebriefDto, extra: Parameters<typeof stubFetch>[0] = {}) {
  const fetchMock = stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, [`GET ${debriefUrl}`]: { status: 200, body: debrief }, ...extra });
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
            percent: fig(1 / 3),
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
    const missed = within(row).getAllByRole('listitem');
    expect(missed[0]).toHaveTextContent('Item 2 Pick the pipette');
    expect(missed[0]).toHaveTextContent('Answer: A. Beaker · Key: B. Volumetric pipette');
    expect(missed[1]).toHaveTextContent('Answer: not answered · Key: B. Volumetric pipette');
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
