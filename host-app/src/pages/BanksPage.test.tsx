import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { makeBank } from '@/test/authoringFactories';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';
import { routes } from '@/routes';

const me = { status: 200, body: makeMe() };
const alpha = makeBank({ id: '7b000000-0000-4000-8000-00000000000a', title: 'Alpha safety', tags: ['safety'], itemCount: 3 });
const beta = makeBank({
  id: '7b000000-0000-4000-8000-00000000000b',
  title: 'Beta norms',
  tags: ['norms'],
  itemCount: 9,
  access: 'view',
  ownerName: 'Maja Lindqvist',
});
const old = makeBank({ id: '7b000000-0000-4000-8000-00000000000c', title: 'Old bank', archivedAt: '2026-06-01T00:00:00.000Z' });

const list = (query: string) => `GET /api/banks?${query}`;
const rowTitles = () => screen.getAllByRole('rowheader').map((cell) => within(cell).getByRole('link').textContent);

describe('BanksPage', () => {
  it('asks the server to sort by the clicked column, toggling direction, and shows rows in that order', async () => {
    stubFetch({
      'GET /api/me': me,
      [list('archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [beta, alpha] },
      [list('archived=false&sort=title&dir=asc')]: { status: 200, body: [alpha, beta] },
      [list('archived=false&sort=title&dir=desc')]: { status: 200, body: [beta, alpha] },
    });
    renderApp(routes.banks.path);
    const user = userEvent.setup();

    await screen.findByRole('link', { name: 'Beta norms' });
    expect(rowTitles()).toEqual(['Beta norms', 'Alpha safety']);
    expect(screen.getByRole('columnheader', { name: /updated/i })).toHaveAttribute('aria-sort', 'descending');

    await user.click(screen.getByRole('button', { name: /^title/i }));
    await waitFor(() => expect(rowTitles()).toEqual(['Alpha safety', 'Beta norms']));
    expect(screen.getByRole('columnheader', { name: /title/i })).toHaveAttribute('aria-sort', 'ascending');

    await user.click(screen.getByRole('button', { name: /^title/i }));
    await waitFor(() => expect(rowTitles()).toEqual(['Beta norms', 'Alpha safety']));
    expect(screen.getByRole('columnheader', { name: /title/i })).toHaveAttribute('aria-sort', 'descending');
  });

  it('shows tags, item counts and who owns a shared bank; only the owner gets archive and delete', async () => {
    stubFetch({ 'GET /api/me': me, [list('archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha, beta] } });
    renderApp(routes.banks.path);

    const betaRow = (await screen.findByRole('link', { name: 'Beta norms' })).closest('tr')!;
    expect(within(betaRow).getByText('norms')).toBeInTheDocument();
    expect(within(betaRow).getByText('9')).toBeInTheDocument();
    expect(within(betaRow).getByText('Shared by Maja Lindqvist · view only')).toBeInTheDocument();
    expect(within(betaRow).queryByRole('button', { name: /delete/i })).not.toBeInTheDocument();
    const alphaRow = screen.getByRole('link', { name: 'Alpha safety' }).closest('tr')!;
    expect(within(alphaRow).getByText('Yours')).toBeInTheDocument();
    expect(within(alphaRow).getByRole('button', { name: 'Delete Alpha safety' })).toBeInTheDocument();
  });

  it('filters by title search, by tag and by including archived banks', async () => {
    stubFetch({
      'GET /api/me': me,
      [list('archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha, beta] },
      [list('q=alp&archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha] },
      [list('q=alp&tag=safety&archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha] },
      [list('q=alp&tag=safety&archived=all&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha, old] },
    });
    renderApp(routes.banks.path);
    const user = userEvent.setup();
    await screen.findByRole('link', { name: 'Beta norms' });

    await user.type(screen.getByLabelText('Search titles'), 'alp');
    await waitFor(() => expect(rowTitles()).toEqual(['Alpha safety']));
    await user.type(screen.getByLabelText('Tag'), 'safety');
    await user.click(screen.getByRole('switch', { name: 'Show archived banks' }));
    await waitFor(() => expect(rowTitles()).toEqual(['Alpha safety', 'Old bank']));
    const oldRow = screen.getByRole('link', { name: 'Old bank' }).closest('tr')!;
    expect(within(oldRow).getByText('Archived')).toBeInTheDocument();
  });

  it('deletes a bank only after the confirmation', async () => {
    let banks = [alpha];
    const fetchMock = stubFetch({
      'GET /api/me': me,
      [list('archived=false&sort=updatedAt&dir=desc')]: () => ({ status: 200, body: banks }),
      [`DELETE /api/banks/${alpha.id}`]: () => {
        banks = [];
        return { status: 204 };
      },
    });
    renderApp(routes.banks.path);
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Delete Alpha safety' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'DELETE')).toBe(false);
    await user.click(within(dialog).getByRole('button', { name: 'Delete bank' }));

    expect(await screen.findByText('No banks yet')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([url, init]) => url === `/api/banks/${alpha.id}` && init?.method === 'DELETE')).toBe(true);
  });

  it('lists the server’s row-and-column report when a CSV import is refused, and stays on the page', async () => {
    const report = makeApiError('validation_failed', '2 cells need attention. Nothing was imported.', [
      { field: 'row 3, column correct', message: '"C" is not one of the filled options (A, B).' },
      { field: 'row 5, column tolerance_kind', message: 'Write absolute or relative (or leave it empty for absolute).' },
    ]);
    const fetchMock = stubFetch({
      'GET /api/me': me,
      [list('archived=false&sort=updatedAt&dir=desc')]: { status: 200, body: [alpha] },
      'POST /api/banks/import': { status: 400, body: report },
    });
    const { router } = renderApp(routes.banks.path);
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Import CSV' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText('Bank title (optional)'), 'Burners');
    const file = new File(['type,prompt\n'], 'bank.csv', { type: 'text/csv' });
    await user.upload(within(dialog).getByLabelText('CSV file'), file);
    await user.click(within(dialog).getByRole('button', { name: 'Import' }));

    const problems = await within(dialog).findByRole('list', { name: 'Problems in the file' });
    const lines = within(problems).getAllByRole('listitem').map((li) => li.textContent);
    expect(lines).toEqual([
      'Row 3, column correct: "C" is not one of the filled options (A, B).',
      'Row 5, column tolerance_kind: Write absolute or relative (or leave it empty for absolute).',
    ]);
    expect(within(dialog).getByRole('alert')).toHaveTextContent('Nothing was imported');
    expect(router.state.location.pathname).toBe('/banks');

    const [, init] = fetchMock.mock.calls.find(([url]) => url === '/api/banks/import')!;
    const form = init?.body as FormData;
    expect(form.get('title')).toBe('Burners');
    expect((form.get('file') as File).name).toBe('bank.csv');
  });
});
