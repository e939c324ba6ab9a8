import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeDebriefSummary, noFig } from '@/features/debrief/testing/debriefFactories';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

describe('DebriefsPage', () => {
  it('lists ended sessions newest first, each linking to its debrief', async () => {
    const older = makeDebriefSummary({ sessionId: 's-old', bankTitle: 'Lab safety', className: null, playedAt: '2025-02-01T09:00:00.000Z', classAccuracy: noFig('no answers') });
    const newer = makeDebriefSummary({ sessionId: 's-new', playedAt: '2025-03-04T09:15:00.000Z', playerCount: 24, revisitCount: 2 });
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, 'GET /api/debriefs': { status: 200, body: [older, newer] } });
    renderApp(routes.debriefs.build());

    const rows = (await screen.findAllByRole('row')).slice(1);
    expect(within(rows[0]!).getByRole('link', { name: 'Lab glassware' })).toHaveAttribute('href', routes.debrief.build('s-new'));
    expect(rows[0]).toHaveTextContent('Chemistry 10B');
    expect(rows[0]).toHaveTextContent('62.5%');
    expect(within(rows[1]!).getByRole('link', { name: 'Lab safety' })).toHaveAttribute('href', routes.debrief.build('s-old'));
    expect(rows[1]).toHaveTextContent('Ad-hoc group');
    expect(rows[1]).toHaveTextContent('not enough data');
  });

  it('shows the empty state when no session has ended', async () => {
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, 'GET /api/debriefs': { status: 200, body: [] } });
    renderApp(routes.debriefs.build());
    expect(await screen.findByRole('heading', { name: 'No debriefs yet' })).toBeInTheDocument();
  });
});
