import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { ClassTrendDto } from '@covalent/shared-types';
import {
  CLASS_ID,
  SESSION_ID,
  fig,
  makeCatchupSummary,
  makeClassStudentTrend,
  makeClassTrend,
  noFig,
} from '@/features/debrief/testing/debriefFactories';
import { formatDateTime } from '@/features/debrief/utils/formatDate';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

function openTrends(trend: ClassTrendDto) {
  stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, [`GET /api/classes/${CLASS_ID}/trends`]: { status: 200, body: trend } });
  renderApp(routes.classTrends.build(CLASS_ID));
}

describe('ClassTrendsPage', () => {
  it('labels the chart and puts the same numbers in a table, one row per session', async () => {
    openTrends(makeClassTrend());

    expect(await screen.findByRole('img', { name: /accuracy by tag for Chemistry 10B across 2 sessions/ })).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Accuracy by tag per session' });
    expect(within(table).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Session', 'glassware', 'safety']);
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent('Lab glassware');
    expect(rows[0]).toHaveTextContent('50%');
    expect(rows[0]).toHaveTextContent('not played');
    expect(rows[1]).toHaveTextContent('75%');
    expect(rows[1]).toHaveTextContent('90%');
  });

  it("lists every student with their figures, each name opening that student's history", async () => {
    openTrends(
      makeClassTrend({
        students: [
          makeClassStudentTrend({ rosterEntryId: 'e-1', displayName: 'Amal H.', sessionsPlayed: 3, meanPercent: fig(72.5), openCards: 2, clearedCards: 4 }),
          makeClassStudentTrend({ rosterEntryId: 'e-2', displayName: 'Noor B.', sessionsPlayed: 0, meanPercent: noFig('no session with a computed percent'), openCards: 0, clearedCards: 0 }),
        ],
      }),
    );
    expect(await screen.findByRole('heading', { level: 2, name: 'Students' })).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Students of the class' });
    expect(within(table).getByRole('link', { name: 'Amal H.' })).toHaveAttribute('href', routes.studentHistory.build(CLASS_ID, 'e-1'));
    expect(within(table).getByRole('link', { name: 'Noor B.' })).toHaveAttribute('href', '/classes/' + CLASS_ID + '/students/e-2');
    const amal = within(table).getByRole('row', { name: /Amal H\./ });
    expect(within(amal).getAllByRole('cell').map((c) => c.textContent)).toEqual(['3', '72.5%', '2', '4']);
    expect(within(within(table).getByRole('row', { name: /Noor B\./ })).getByText('not enough data')).toBeInTheDocument();
  });

  it("lists the class's catch-ups with their progress, each linking to its debrief", async () => {
    openTrends(
      makeClassTrend({
        catchups: [
          makeCatchupSummary({ bankTitle: 'Lab glassware' }),
          makeCatchupSummary({ id: 'c-2', sessionId: 's2', bankTitle: 'Lab safety', closedAt: '2025-03-12T08:00:00.000Z', accuracy: noFig('No catch-up answers yet.') }),
        ],
      }),
    );
    expect(await screen.findByRole('heading', { level: 2, name: 'Catch-ups' })).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Catch-ups of the class' });
    const first = within(table).getByRole('row', { name: /Lab glassware/ });
    expect(within(first).getByRole('link', { name: 'Lab glassware' })).toHaveAttribute('href', routes.debrief.build(SESSION_ID));
    expect(within(first).getAllByRole('cell').map((c) => c.textContent)).toEqual([formatDateTime('2025-03-04T10:00:00.000Z'), 'open', '5 of 12', '7 of 20', '62.5%']);
    const second = within(table).getByRole('row', { name: /Lab safety/ });
    expect(second).toHaveTextContent('closed');
    expect(second).toHaveTextContent('not enough data');
  });

  it('says so when the class has no students or catch-ups yet, and keeps the trends empty state', async () => {
    openTrends(makeClassTrend({ sessions: [], tags: [] }));
    expect(await screen.findByText('No students on the class list yet.')).toBeInTheDocument();
    expect(screen.getByText("No catch-ups yet. Create one from a session's debrief.")).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'No trends yet' })).toBeInTheDocument();
    expect(screen.queryByRole('table')).toBeNull();
  });
});
