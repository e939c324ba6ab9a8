import type { BankDto, ClassDto, ItemDto } from '@covalent/shared-types';
import { screen, fireEvent, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { makeSessionDto } from '@/features/live/testing/liveFactories';
import { setHostSocketFactory } from '@/realtime';
import { FakeHostSocket } from '@/realtime/testing/FakeHostSocket';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch } from '@/test/stubFetch';

const bank = { id: 'bank-1', title: 'Lab entry & exit procedures', itemCount: 3, archivedAt: null } as BankDto;
const archived = { id: 'bank-old', title: 'Old bank', itemCount: 2, archivedAt: '2024-06-01T00:00:00.000Z' } as BankDto;
const klass = { id: 'class-1', name: 'Chemistry 10', period: 'P3' } as ClassDto;
const item = (id: string, position: number, prompt: string) => ({ id, position, prompt, tags: [] }) as unknown as ItemDto;
const items = [item('i1', 0, 'Goggles on when?'), item('i2', 1, 'Where do bags go?'), item('i3', 2, 'Who signs the log?')];

function stubSetup() {
  return stubFetch({
    'GET /api/me': { status: 200, body: makeMe() },
    'GET /api/banks': { status: 200, body: [archived, bank] },
    'GET /api/classes?archived=false': { status: 200, body: [klass] },
    'GET /api/banks/bank-1/items': { status: 200, body: items },
    'POST /api/sessions': { status: 201, body: makeSessionDto({ id: 'sess-new' }) },
    'GET /api/banks/bank-1': { status: 404, body: { ok: false, error: 'not_found', message: 'No such bank.' } },
  });
}

afterEach(() => setHostSocketFactory(null));

describe('SessionSetupPage', () => {
  it('builds the CreateSessionRequest from the form and opens the host screen', async () => {
    const fetchMock = stubSetup();
    let hostSocketFor = '';
    setHostSocketFactory((sessionId) => {
      hostSocketFor = sessionId;
      return new FakeHostSocket();
    });
    const { router } = renderApp(routes.sessionNew.build());
    const user = userEvent.setup();

    const bankSelect = await screen.findByLabelText('Bank');
    await screen.findByRole('option', { name: 'Lab entry & exit procedures (3 items)' });
    expect(screen.queryByRole('option', { name: /Old bank/ })).not.toBeInTheDocument();
    await user.selectOptions(bankSelect, 'bank-1');
    // Two sections of one course share a name, so the period is in the option.
    expect(screen.getByRole('option', { name: 'Chemistry 10 · period 3' })).toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText('Class'), 'class-1');

    await user.click(await screen.findByRole('checkbox', { name: 'Choose and order the items myself' }));
    await user.click(screen.getByRole('button', { name: 'Move item 3 up' }));
    await user.click(screen.getByRole('checkbox', { name: '1. Goggles on when?' }));

    await user.click(screen.getByRole('radio', { name: /numbered — Numbered turns/ }));
    const seconds = screen.getByLabelText('Round time (seconds)');
    await user.clear(seconds);
    await user.type(seconds, '45');
    fireEvent.change(screen.getByLabelText(/Speed weight/), { target: { value: '0' } });
    await user.click(screen.getByRole('radio', { name: 'Top 3 only' }));
    await user.click(screen.getByRole('radio', { name: 'Number of teams' }));
    const teams = screen.getByLabelText('Teams');
    await user.clear(teams);
    await user.type(teams, '5');
    await user.click(screen.getByRole('radio', { name: /Balanced/ }));
    await user.click(screen.getByRole('radio', { name: 'Constellations' }));
    await user.click(screen.getByRole('button', { name: 'Create session and open host screen' }));

    expect(await screen.findByText('Connecting to the session…')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(routes.hostSession.build('sess-new'));
    expect(hostSocketFor).toBe('sess-new');
    expect(sentBody(fetchMock, 'POST', '/api/sessions')).toEqual({
      bankId: 'bank-1',
      itemIds: ['i3', 'i2'],
      classId: 'class-1',
      format: 'numbered',
      roundSeconds: 45,
      speedWeight: 0,
      standings: 'top3',
      teamCount: 5,
      mixerMode: 'balanced',
      namePack: 'constellations',
    });
  });

  it('comes with the class chosen when opened from a class page', async () => {
    stubSetup();
    renderApp(routes.sessionNew.build({ classId: 'class-1' }));
    await screen.findByRole('option', { name: 'Chemistry 10 · period 3' });
    expect(screen.getByLabelText('Class')).toHaveValue('class-1');
  });

  it('sends what the form shows when a link names a class or bank the teacher cannot pick', async () => {
    const fetchMock = stubSetup();
    // An archived bank and a class not in the list (e.g. archived since the link was made).
    renderApp(routes.sessionNew.build({ bankId: 'bank-old', classId: 'class-gone' }));
    const user = userEvent.setup();
    await screen.findByRole('option', { name: 'Chemistry 10 · period 3' });
    await user.click(screen.getByRole('button', { name: 'Create session and open host screen' }));
    expect(await screen.findByText('Choose a bank.')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);

    await user.selectOptions(screen.getByLabelText('Bank'), 'bank-1');
    await user.click(screen.getByRole('button', { name: 'Create session and open host screen' }));
    await vi.waitFor(() => expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(true));
    expect(sentBody(fetchMock, 'POST', '/api/sessions')).toMatchObject({ bankId: 'bank-1', classId: null });
  });

  it('names each format in our words with a one-line description', async () => {
    stubSetup();
    renderApp(routes.sessionNew.build({ bankId: 'bank-1' }));
    const formats = within((await screen.findByText('Format')).closest('fieldset')!);
    expect(formats.getAllByRole('radio').map((r) => r.textContent)).toEqual([
      expect.stringMatching(/^huddle — Team vote/),
      expect.stringMatching(/^numbered — Numbered turns/),
      expect.stringMatching(/^solo — Everyone answers/),
    ]);
    expect(screen.getByText('How much a quick answer adds. 0 turns speed off.')).toBeInTheDocument();
  });

  it('explains what is wrong instead of sending a bad request', async () => {
    const fetchMock = stubSetup();
    renderApp(routes.sessionNew.build());
    const user = userEvent.setup();
    const seconds = await screen.findByLabelText('Round time (seconds)');
    await user.clear(seconds);
    await user.type(seconds, '1');
    await user.click(screen.getByRole('button', { name: 'Create session and open host screen' }));

    expect(screen.getByText('Choose a bank.')).toBeInTheDocument();
    expect(screen.getByText('Enter whole seconds from 5 to 300.')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);
  });
});
