import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CLASS_ID, makeClassTrend } from '@/features/debrief/testing/debriefFactories';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

describe('ClassTrendsPage', () => {
  it('labels the chart and puts the same numbers in a table, one row per session', async () => {
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, [`GET /api/classes/${CLASS_ID}/trends`]: { status: 200, body: makeClassTrend() } });
    renderApp(routes.classTrends.build(CLASS_ID));

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
});
