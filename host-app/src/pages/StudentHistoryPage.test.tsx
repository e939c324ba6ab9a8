import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { StudentHistoryDto } from '@covalent/shared-types';
import {
  CLASS_ID,
  ENTRY_ID,
  fig,
  makeCatchupCard,
  makeDeletePlayerData,
  makeStudentCatchup,
  makeStudentHistory,
  makeStudentSession,
  noFig,
} from '@/features/debrief/testing/debriefFactories';
import { formatDateTime } from '@/features/debrief/utils/formatDate';
import { routes } from '@/routes';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { callsTo, stubFetch, type FetchRoutes, type StubResponse } from '@/test/stubFetch';

const historyUrl = `/api/classes/${CLASS_ID}/roster/${ENTRY_ID}/history`;

const dataUrl = `/api/classes/${CLASS_ID}/roster/${ENTRY_ID}/data`;

function openHistory(response: StubResponse | (() => StubResponse), extra: FetchRoutes = {}) {
  const fetchMock = stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, [`GET ${historyUrl}`]: response, ...extra });
  renderApp(routes.studentHistory.build(CLASS_ID, ENTRY_ID));
  return fetchMock;
}

/** The value beside a DataList label. */
const valueOf = (container: HTMLElement, label: string) => within(container).getByText(label, { selector: 'dt' }).nextElementSibling?.textContent;

const history = (overrides: Partial<StudentHistoryDto> = {}) => ({ status: 200, body: makeStudentHistory(overrides) });

describe('StudentHistoryPage', () => {
  it('heads the page with the student, their class and table, the mean percent and ways back', async () => {
    openHistory(history({ meanPercent: fig(72.5) }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Amal H.' })).toBeInTheDocument();
    expect(screen.getByText('Chemistry 10B · Table 3')).toBeInTheDocument();
    expect(valueOf(document.body, 'Mean percent')).toBe('72.5%');
    expect(screen.getByRole('link', { name: 'Back to the class' })).toHaveAttribute('href', routes.classDetail.build(CLASS_ID));
    expect(screen.getByRole('link', { name: 'Class trends' })).toHaveAttribute('href', routes.classTrends.build(CLASS_ID));
    expect(screen.getByRole('heading', { level: 1 }).closest('.debrief-print-root')).not.toBeNull();
    expect(screen.getByRole('link', { name: 'Back to the class' }).closest('.debrief-no-print')).not.toBeNull();
  });

  it('prints the page from its Print button', async () => {
    const print = vi.spyOn(window, 'print').mockImplementation(() => {});
    openHistory(history());
    await userEvent.click(await screen.findByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledTimes(1);
  });

  it("lists each session with the student's figures and the items they missed, answer beside the key", async () => {
    openHistory(
      history({
        sessions: [
          makeStudentSession({
            sessionId: 's-9',
            bankTitle: 'Lab safety',
            format: 'numbered',
            score: 1.5,
            percent: fig(37.5),
            itemCount: 4,
            answered: 3,
            missed: [
              { itemId: 'i1', prompt: 'Where do goggles go?', credit: 0, answerText: 'B. On the bench', keyText: 'A. On your eyes' },
              { itemId: 'i2', prompt: 'Order the clean-up', credit: 0.5, answerText: 'C, A, B', keyText: 'A, B, C' },
              { itemId: 'i3', prompt: 'Nearest eyewash?', credit: 0, answerText: '', keyText: 'By the door' },
            ],
          }),
        ],
      }),
    );
    const table = await screen.findByRole('table', { name: 'Sessions' });
    const row = within(table).getByRole('row', { name: /Lab safety/ });
    expect(within(row).getByRole('link', { name: 'Lab safety' })).toHaveAttribute('href', routes.debrief.build('s-9'));
    const cells = within(row).getAllByRole('cell').map((c) => c.textContent);
    expect(cells.slice(0, 6)).toEqual([formatDateTime('2025-03-04T09:15:00.000Z'), 'Numbered turns', '1.50', '37.5%', '3 of 4', '3']);
    const missed = within(row).getAllByRole('listitem');
    expect(missed).toHaveLength(3);
    expect(missed[0]).toHaveTextContent('Where do goggles go?Answer: B. On the bench · Key: A. On your eyes');
    expect(missed[1]).toHaveTextContent('partial credit 0.50');
    expect(missed[2]).toHaveTextContent('Answer: not answered · Key: By the door');
  });

  it('shows each catch-up with its progress and every card', async () => {
    openHistory(
      history({
        catchups: [
          makeStudentCatchup({
            bankTitle: 'Lab glassware',
            closedAt: '2025-03-12T08:00:00.000Z',
            cardCount: 2,
            clearedCount: 1,
            attempts: 3,
            correctAttempts: 1,
            items: [
              makeCatchupCard({ prompt: 'Pick the pipette', box: 2, attempts: 2, correctAttempts: 1, lastCorrect: true, dueAt: '2025-03-07T10:00:00.000Z' }),
              makeCatchupCard({ itemId: 'i2', prompt: 'Read the meniscus', attempts: 1, lastCorrect: false }),
            ],
          }),
        ],
      }),
    );
    const article = await screen.findByRole('article', { name: /Lab glassware/ });
    expect(article).toHaveTextContent('closed');
    expect(valueOf(article, 'Cards cleared')).toBe('1 of 2');
    expect(valueOf(article, 'Attempts')).toBe('3');
    expect(valueOf(article, 'Correct attempts')).toBe('1');
    const rows = within(within(article).getByRole('table')).getAllByRole('row').slice(1);
    expect(within(rows[0]).getByRole('rowheader')).toHaveTextContent('Pick the pipette');
    expect(within(rows[0]).getAllByRole('cell').map((c) => c.textContent)).toEqual(['2', '2', '1', 'right', formatDateTime('2025-03-07T10:00:00.000Z')]);
    expect(rows[1]).toHaveTextContent('wrong');
  });

  it('says so when there are no sessions or catch-ups yet, and when the mean cannot be computed', async () => {
    openHistory(history({ sessions: [], catchups: [], tableGroup: null, meanPercent: noFig('no session with a computed percent') }));
    expect(await screen.findByText('No ended sessions for this student in this class yet.')).toBeInTheDocument();
    expect(screen.getByText('No catch-up cards for this student yet.')).toBeInTheDocument();
    expect(screen.getByText('Chemistry 10B · No table group')).toBeInTheDocument();
    expect(screen.getByText('not enough data')).toHaveAttribute('title', 'no session with a computed percent');
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('explains a 404 without showing anything about the student, with the way back', async () => {
    openHistory({ status: 404, body: makeApiError('not_found', 'Roster entry not found.') });
    expect(await screen.findByRole('alert')).toHaveTextContent('No history to show: this student is not on the class list');
    expect(screen.getByRole('heading', { level: 1, name: 'Student history' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the class' })).toHaveAttribute('href', routes.classDetail.build(CLASS_ID));
  });

  it("shows the server's message for other failures", async () => {
    openHistory({ status: 500, body: makeApiError('internal', 'Something broke on our side.') });
    expect(await screen.findByRole('alert')).toHaveTextContent('Something broke on our side.');
  });

  describe("deleting a student's data", () => {
    it('offers the class owner a button kept out of print, and sends nothing until confirmed', async () => {
      const fetchMock = openHistory(history({ canDeleteData: true }));
      const user = userEvent.setup();
      const button = await screen.findByRole('button', { name: "Delete this student's data" });
      expect(button.closest('.debrief-no-print')).not.toBeNull();
      expect(screen.queryByText("Only the class's owner can delete a student's data.")).toBeNull();

      await user.click(button);
      const dialog = await screen.findByRole('alertdialog', { name: "Delete Amal H.'s data?" });
      expect(dialog).toHaveTextContent('Their answers in every session of this class and their catch-up cards are deleted.');
      expect(dialog).toHaveTextContent('Their name stays on the class list, and the debriefs count them as removed. This cannot be undone.');
      expect(callsTo(fetchMock, 'DELETE', dataUrl)).toHaveLength(0);

      await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
      expect(screen.queryByRole('alertdialog')).toBeNull();
      expect(callsTo(fetchMock, 'DELETE', dataUrl)).toHaveLength(0);
    });

    it('after confirming, sends one DELETE, says how many responses went and shows the refetched history', async () => {
      let deleted = false;
      const fetchMock = openHistory(() => history(deleted ? { sessions: [], catchups: [] } : {}), {
        [`DELETE ${dataUrl}`]: () => {
          deleted = true;
          return { status: 200, body: makeDeletePlayerData(5) };
        },
      });
      const user = userEvent.setup();
      expect(await screen.findByRole('table', { name: 'Sessions' })).toBeInTheDocument();

      await user.click(screen.getByRole('button', { name: "Delete this student's data" }));
      await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete data' }));

      expect(await screen.findByRole('status')).toHaveTextContent("Deleted Amal H.'s data: 5 responses.");
      expect(await screen.findByText('No ended sessions for this student in this class yet.')).toBeInTheDocument();
      expect(screen.getByText('No catch-up cards for this student yet.')).toBeInTheDocument();
      expect(callsTo(fetchMock, 'DELETE', dataUrl)).toHaveLength(1);
      expect(callsTo(fetchMock, 'GET', historyUrl)).toHaveLength(2);
    });

    it("shows the server's message when the deletion fails, and keeps the history", async () => {
      openHistory(history(), {
        [`DELETE ${dataUrl}`]: { status: 403, body: makeApiError('forbidden', "Only the class's owner can do this.") },
      });
      const user = userEvent.setup();
      await user.click(await screen.findByRole('button', { name: "Delete this student's data" }));
      await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete data' }));

      expect(await screen.findByRole('alert')).toHaveTextContent("Only the class's owner can do this.");
      expect(screen.queryByRole('status')).toBeNull();
      expect(screen.getByRole('table', { name: 'Sessions' })).toBeInTheDocument();
    });

    it('shows co-teachers a note instead of the button', async () => {
      openHistory(history({ canDeleteData: false }));
      expect(await screen.findByText("Only the class's owner can delete a student's data.")).toBeInTheDocument();
      expect(screen.queryByRole('button', { name: "Delete this student's data" })).toBeNull();
    });
  });
});
