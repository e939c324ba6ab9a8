import type { HostSessionView } from '@covalent/shared-types';
import { act, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { makeBankDetail, makeHostView, makeRunningView, makeSessionDto, makeTiming } from '@/features/live/testing/liveFactories';
import { setHostSocketFactory } from '@/realtime';
import { FakeHostSocket } from '@/realtime/testing/FakeHostSocket';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

/** Opens the host screen with a fake socket that answers resync with `view`, and connects it. */
async function renderHost(view: HostSessionView, bank = makeBankDetail()) {
  const socket = new FakeHostSocket();
  socket.view = view;
  socket.answer = () => ({ ok: true, view });
  setHostSocketFactory(() => socket);
  stubFetch({ 'GET /api/me': { status: 200, body: makeMe() }, 'GET /api/banks/bank-1': { status: 200, body: bank } });
  const rendered = renderApp(routes.hostSession.build(view.session.id));
  await waitFor(() => expect(socket.listeners.has('connect')).toBe(true));
  act(() => socket.serverSends('connect'));
  return { socket, ...rendered };
}

afterEach(() => setHostSocketFactory(null));

describe('HostSessionPage', () => {
  it('opens the host socket for the session in the URL, outside the app shell', async () => {
    let askedFor = '';
    const socket = new FakeHostSocket();
    setHostSocketFactory((sessionId) => {
      askedFor = sessionId;
      return socket;
    });
    stubFetch({ 'GET /api/me': { status: 200, body: makeMe() } });
    renderApp(routes.hostSession.build('sess-9'));
    expect(await screen.findByText('Connecting to the session…')).toBeInTheDocument();
    expect(askedFor).toBe('sess-9');
    expect(screen.queryByRole('navigation', { name: 'Main' })).not.toBeInTheDocument();
  });

  it('shows the join code, the player address and a QR image named after the code in the lobby', async () => {
    await renderHost(makeHostView());

    expect(await screen.findByText('KX7P2M')).toBeInTheDocument();
    expect(screen.getByText(`${window.location.origin}/play/`)).toBeInTheDocument();
    const qr = await screen.findByRole('img', { name: 'QR code to join with code KX7P2M' });
    expect(qr.getAttribute('src')).toMatch(/^data:image\/svg\+xml/);
    expect(screen.getByText('For practice and review, not for grading.')).toBeInTheDocument();
    expect(screen.getByText(/0 same-table pairs, 2 repeat pairs/)).toBeInTheDocument();
  });

  it('lists teams by name with a pattern swatch, and the unplaced players', async () => {
    await renderHost(makeHostView());

    const argon = await screen.findByRole('region', { name: 'Team Argon' });
    expect(within(argon).getByRole('img', { name: 'dots on orange' })).toBeInTheDocument();
    expect(within(argon).getByText('Sam')).toBeInTheDocument();
    const boron = screen.getByRole('region', { name: 'Team Boron' });
    expect(within(boron).getByRole('img', { name: 'stripes on blue' })).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Not on a team yet' })).getByText('Lena')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: '8 players in 2 teams' })).toBeInTheDocument();
  });

  it('sends reshuffle, lock and start from the lobby buttons', async () => {
    const { socket } = await renderHost(makeHostView());
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Reshuffle' }));
    await user.click(screen.getByRole('button', { name: 'Lock joining' }));
    await user.click(screen.getByRole('button', { name: 'Start' }));

    expect(socket.commands).toEqual([{ type: 'reshuffle' }, { type: 'lock_joining', locked: true }, { type: 'start' }]);
  });

  it('renames a player through the dialog', async () => {
    const { socket } = await renderHost(makeHostView());
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Rename Sam' }));
    const input = screen.getByLabelText('New nickname');
    await user.clear(input);
    await user.type(input, 'Sam R');
    await user.click(screen.getByRole('button', { name: 'Save name' }));

    expect(socket.commands).toEqual([{ type: 'rename_player', playerId: 'p1', nickname: 'Sam R' }]);
  });

  it('updates the screen when the server pushes host:state', async () => {
    const { socket } = await renderHost(makeHostView());
    await screen.findByText('KX7P2M');

    act(() => socket.serverSends('host:state', makeRunningView()));

    expect(await screen.findByRole('heading', { name: 'Where do bags go when you enter the lab?' })).toBeInTheDocument();
    expect(screen.queryByText('KX7P2M')).not.toBeInTheDocument();
  });

  it('shows lettered options and per-team counts, never who answered or whether they were right', async () => {
    await renderHost(makeRunningView());

    const options = await screen.findByRole('list', { name: 'Options' });
    expect(within(options).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'AUnder your stool',
      'BOn the shelf by the door',
      'COn the bench',
    ]);
    const progress = screen.getByRole('list', { name: 'Answers so far' });
    const rows = within(progress).getAllByRole('listitem');
    expect(rows[0]).toHaveTextContent('Argon');
    expect(rows[0]).toHaveTextContent('3 of 4 answered');
    expect(rows[1]).toHaveTextContent('1 of 3 answered');
    expect(progress).not.toHaveTextContent(/Sam|Noor|Kofi|correct|wrong/i);
    expect(screen.getByRole('timer', { name: 'Time left' })).toHaveTextContent(/^(19|20)seconds left$/);
  });

  it('before a round opens, shows each team’s size instead of "0 of 0 answered"', async () => {
    await renderHost(
      makeRunningView({
        timing: makeTiming({ status: 'ready', deadlineAt: null }),
        progress: [{ teamId: 'team-ar', answered: 0, members: 0 }, { teamId: 'team-b', answered: 0, members: 0 }],
      }),
    );
    const rows = within(await screen.findByRole('list', { name: 'Teams' })).getAllByRole('listitem');
    // The factory's Argon has four members (one away, still a player); Boron three.
    expect(rows[0]).toHaveTextContent(/Argon\s*4 players$/);
    expect(rows[1]).toHaveTextContent(/Boron\s*3 players$/);
    expect(screen.queryByRole('list', { name: 'Answers so far' })).not.toBeInTheDocument();
  });

  it('in numbered, says whether each team has answered rather than counting members who may not answer', async () => {
    await renderHost(
      makeRunningView(
        { progress: [{ teamId: 'team-ar', answered: 1, members: 4 }, { teamId: 'team-b', answered: 0, members: 3 }] },
        { session: makeSessionDto({ status: 'running', format: 'numbered' }) },
      ),
    );
    const rows = within(await screen.findByRole('list', { name: 'Answers so far' })).getAllByRole('listitem');
    expect(rows[0]).toHaveTextContent(/Argon\s*Answered$/);
    expect(rows[1]).toHaveTextContent(/Not yet answered$/);
    expect(screen.getByRole('list', { name: 'Answers so far' })).not.toHaveTextContent(/of \d answered/);
  });

  it('sends the command of each shortcut key for the state on screen, and ignores keys while typing', async () => {
    const { socket } = await renderHost(makeRunningView());
    await screen.findByRole('list', { name: 'Options' });
    const user = userEvent.setup();

    await user.keyboard('pct');
    expect(socket.commands).toEqual([{ type: 'pause' }, { type: 'close_round' }, { type: 'add_time' }]);

    act(() => socket.serverSends('host:state', makeRunningView({ timing: makeTiming({ status: 'closed' }) })));
    await user.keyboard('r');
    act(() => socket.serverSends('host:state', makeRunningView({ timing: makeTiming({ status: 'revealed' }) })));
    await user.keyboard('n');
    expect(socket.commands.slice(3)).toEqual([{ type: 'reveal' }, { type: 'next' }]);

    const field = document.createElement('input');
    document.body.append(field);
    field.focus();
    await user.keyboard('n');
    field.remove();
    expect(socket.commands).toHaveLength(5);
    expect(screen.getByRole('list', { name: 'Keyboard shortcuts' })).toHaveTextContent('N');
  });

  it('shows the server’s message when a command is refused', async () => {
    const { socket } = await renderHost(makeRunningView());
    socket.answer = () => ({ ok: false, error: 'round_not_open', message: 'That round is already closed.' });
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Close' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('That round is already closed.');
  });

  it('reveals the distribution with the correct option marked in words, and the explanation', async () => {
    const view = makeRunningView({
      timing: makeTiming({ status: 'revealed', deadlineAt: null }),
      reveal: {
        key: { type: 'single', correctOptionId: 'o2' },
        explanation: 'Bags by the door keep the aisles clear for an evacuation.',
        distribution: {
          total: 7,
          counts: [
            { label: 'o1', optionId: 'o1', count: 2, correct: false },
            { label: 'o2', optionId: 'o2', count: 4, correct: true },
            { label: 'o3', optionId: 'o3', count: 1, correct: false },
          ],
        },
      },
    });
    await renderHost(view);

    const bars = within(await screen.findByRole('list', { name: 'How the class answered' })).getAllByRole('listitem');
    expect(bars.map((li) => li.textContent)).toEqual(['A. Under your stool2', 'B. On the shelf by the doorCorrect4', 'C. On the bench1']);
    expect(screen.getByText('Bags by the door keep the aisles clear for an evacuation.')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Answer: B. On the shelf by the door' })).toBeInTheDocument();
  });

  const standings = [
    { teamId: 'team-b', name: 'Boron', rank: 1, points: 2400, correctAnswers: 3 },
    { teamId: 'team-ar', name: 'Argon', rank: 2, points: 1900, correctAnswers: 2 },
    { teamId: 'team-c', name: 'Carbon', rank: 3, points: 1200, correctAnswers: 2 },
    { teamId: 'team-n', name: 'Neon', rank: 4, points: 800, correctAnswers: 1 },
  ];
  const revealed = (visibility: 'full' | 'top3' | 'none') =>
    makeRunningView(
      {
        timing: makeTiming({ status: 'revealed' }),
        reveal: { key: { type: 'single', correctOptionId: 'o1' }, explanation: '', distribution: { total: 0, counts: [] } },
      },
      { session: makeSessionDto({ status: 'running', standings: visibility }), standings },
    );

  it('shows only the top three teams when standings are top3', async () => {
    await renderHost(revealed('top3'));
    const list = within(await screen.findByRole('region', { name: 'Top 3' }));
    expect(list.getAllByRole('listitem')).toHaveLength(3);
    expect(list.queryByText('Neon')).not.toBeInTheDocument();
  });

  it('shows no standings at all when standings are none', async () => {
    await renderHost(revealed('none'));
    await screen.findByRole('list', { name: 'How the class answered' });
    expect(screen.queryByRole('region', { name: /standings|top 3/i })).not.toBeInTheDocument();
    expect(screen.queryByText('2,400 pts')).not.toBeInTheDocument();
  });

  it('shows every team when standings are full', async () => {
    await renderHost(revealed('full'));
    const list = within(await screen.findByRole('region', { name: 'Standings' }));
    expect(list.getAllByRole('listitem')).toHaveLength(4);
  });

  it('ends with class accuracy and the items to revisit', async () => {
    await renderHost(
      makeHostView({
        session: makeSessionDto({ status: 'ended' }),
        summary: { accuracy: 0.72, itemsToRevisit: [{ itemId: 'i4', prompt: 'Where is the eyewash station?', p: 0.31 }] },
      }),
    );
    expect(await screen.findByText('72%')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Items to revisit' })).toHaveTextContent('Where is the eyewash station? (31% correct)');
  });

  it('shows the lab-safety caution only when the bank or the item on screen is tagged safety', async () => {
    const bank = makeBankDetail({
      items: [
        {
          id: 'i3', bankId: 'bank-1', position: 2, createdAt: '', updatedAt: '', type: 'single',
          prompt: 'Where do bags go when you enter the lab?', options: [], key: { type: 'single', correctOptionId: 'o2' },
          explanation: '', tags: ['lab-safety'], imageId: null,
        },
      ],
    });
    const { socket } = await renderHost(makeRunningView(), bank);
    expect(await screen.findByText(/never replace, the school's safety training/)).toBeInTheDocument();

    const other = makeRunningView();
    other.round!.item = { ...other.round!.item, prompt: 'Who signs the lab log?' };
    act(() => socket.serverSends('host:state', other));
    await waitFor(() => expect(screen.queryByText(/never replace, the school's safety training/)).not.toBeInTheDocument());
  });
});
