import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeClass, makeClassDetail } from '@/test/authoringFactories';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const p2 = makeClass({ id: 'c1000000-0000-4000-8000-000000000002', period: '2', rosterCount: 28 });
const old = makeClass({ id: 'c1000000-0000-4000-8000-000000000003', name: 'Physics', period: '4', term: 'Spring 2026', archivedAt: '2026-06-30T00:00:00.000Z' });

describe('ClassesPage', () => {
  it('lists classes with period, term and roster size, and includes archived ones on request', async () => {
    stubFetch({
      'GET /api/me': { status: 200, body: makeMe() },
      'GET /api/classes?archived=false': { status: 200, body: [p2] },
      'GET /api/classes?archived=all': { status: 200, body: [p2, old] },
    });
    renderApp(routes.classes.path);
    const row = (await screen.findByRole('link', { name: 'Chemistry' })).closest('tr')!;
    expect(within(row).getAllByRole('cell').map((c) => c.textContent)).toEqual(['2', 'Autumn 2026', '28', 'Yours']);
    expect(screen.queryByRole('link', { name: 'Physics' })).not.toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole('switch', { name: 'Show archived classes' }));
    const physics = await screen.findByRole('link', { name: 'Physics' });
    expect(within(physics.closest('tr')!).getByText('Archived')).toBeInTheDocument();
  });

  it('creates a class and opens it', async () => {
    const created = makeClassDetail({ id: 'c1000000-0000-4000-8000-000000000009', name: 'Biology', period: '6', term: 'Autumn 2026' });
    const fetchMock = stubFetch({
      'GET /api/me': { status: 200, body: makeMe() },
      'GET /api/classes?archived=false': { status: 200, body: [] },
      'POST /api/classes': { status: 201, body: created },
      [`GET /api/classes/${created.id}`]: { status: 200, body: created },
    });
    const { router } = renderApp(routes.classes.path);
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText(/class name/i), 'Biology');
    await user.type(screen.getByLabelText(/period/i), '6');
    await user.type(screen.getByLabelText(/term/i), 'Autumn 2026');
    await user.click(screen.getByRole('button', { name: 'Create class' }));

    await waitFor(() => expect(router.state.location.pathname).toBe(routes.classDetail.build(created.id)));
    expect(sentBody(fetchMock, 'POST', '/api/classes')).toEqual({ name: 'Biology', period: '6', term: 'Autumn 2026' });
  });
});
