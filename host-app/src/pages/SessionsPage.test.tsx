import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeSessionDto } from '@/features/live/testing/liveFactories';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

describe('SessionsPage', () => {
  it('lists sessions newest first with their settings, and a host-screen link only for live ones', async () => {
    const live = makeSessionDto({ id: 's-live', status: 'running', createdAt: '2025-02-03T10:00:00.000Z' });
    const ended = makeSessionDto({
      id: 's-old',
      status: 'ended',
      joinCode: 'ZZZ999',
      bankTitle: 'Safety symbols',
      className: null,
      format: 'solo',
      createdAt: '2025-01-20T10:00:00.000Z',
    });
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, 'GET /api/sessions': { status: 200, body: [ended, live] } });
    renderApp(routes.sessions.path);

    const rows = (await screen.findAllByRole('row')).slice(1);
    expect(within(rows[0]!).getByRole('rowheader')).toHaveTextContent('Lab entry & exit procedures');
    expect(rows[0]).toHaveTextContent('huddle (Team vote)');
    expect(rows[0]).toHaveTextContent('Running');
    expect(rows[0]).toHaveTextContent('KX7P2M');
    expect(within(rows[0]!).getByRole('link', { name: /Open host screen/ })).toHaveAttribute('href', routes.hostSession.build('s-live'));
    expect(rows[1]).toHaveTextContent('Ad-hoc group');
    expect(rows[1]).not.toHaveTextContent('ZZZ999');
    expect(within(rows[1]!).queryByRole('link', { name: /Open host screen/ })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'New session' })).toHaveAttribute('href', routes.sessionNew.build());
  });
});
