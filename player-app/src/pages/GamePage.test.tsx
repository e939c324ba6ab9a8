import { act, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { PlayerSessionView } from '@covalent/shared-types';
import { describe, expect, it } from 'vitest';
import { App } from '@/app/App';
import { PLAYER_TOKEN_KEY, resumeStoredSession } from '@/realtime';
import { useConnectionStore } from '@/stores/useConnectionStore';
import { useSessionStore } from '@/stores/useSessionStore';
import { ME, numericItem, orderItem, reveal, round, sessionView, singleItem, timing } from '@/test/factories';
import { flush, installFakeSocket } from '@/test/fakeSocket';
import { GamePage } from './GamePage';

const ACCEPTED = { ok: true, duplicate: false, locked: true, acceptedAt: 1 };

async function startGame(view: PlayerSessionView) {
  const installed = installFakeSocket();
  useSessionStore.getState().setJoined({ sessionId: 'sess-1', playerToken: 'tok-1', nickname: 'Sam' });
  await installed.socket.connect('tok-1');
  installed.fake.serverEmit('connect');
  installed.fake.serverEmit('session:state', view);
  await flush(); // let the clock sample land
  const user = userEvent.setup();
  render(<GamePage />);
  const server = (event: string, ...args: unknown[]) => act(() => installed.fake.serverEmit(event, ...args));
  return { ...installed, user, server };
}

describe(GamePage.name, () => {
  it('shows the lobby with the team name, pattern and teammates', async () => {
    await startGame(sessionView({ format: 'numbered' }));
    expect(screen.getByRole('heading', { name: "You're in. Waiting for your teacher to start." })).toBeInTheDocument();
    const card = screen.getByRole('region', { name: /Argon/ });
    expect(within(card).getByText('Pattern: stripes')).toBeInTheDocument();
    expect(within(card).getByText('Ada')).toBeInTheDocument();
    expect(within(card).getByText(/You are number/)).toHaveTextContent('You are number 1');
  });

  it('answers a single item with one tap on a lettered option and focuses the new prompt', async () => {
    const { fake, user, server } = await startGame(sessionView({ status: 'running' }));
    fake.respond('answer:submit', ACCEPTED);
    server('round:opened', { roundIndex: 0, itemCount: 10, item: singleItem(), timing: timing(), calledPlayerId: null });

    const prompt = screen.getByRole('heading', { name: singleItem().prompt });
    expect(prompt).toHaveFocus();
    const optionB = screen.getByRole('button', { name: 'B. On your face' });
    await user.click(optionB);

    expect(fake.commands('answer:submit')).toEqual([
      { clientMessageId: 'm-1', roundIndex: 0, response: { type: 'single', optionId: 'o-face' } },
    ]);
    expect(await screen.findByText(/Answer sent: B\. On your face/)).toBeInTheDocument();
    expect(optionB).toBeDisabled();
  });

  it("shows the server's refusal when the answer came too late", async () => {
    const { fake, user } = await startGame(sessionView({ status: 'running', round: round() }));
    fake.respond('answer:submit', {
      ok: false,
      error: 'too_late',
      message: "Time was up — your answer didn't count this round.",
    });
    await user.click(screen.getByRole('button', { name: 'A. On the bench' }));
    expect(await screen.findByRole('alert')).toHaveTextContent("Time was up — your answer didn't count this round.");
  });

  it('says the round is closed, not that time ran out, when everyone answered early', async () => {
    const { fake, user, server } = await startGame(sessionView({ status: 'running', round: round() }));
    fake.respond('answer:submit', ACCEPTED);
    await user.click(screen.getByRole('button', { name: 'A. On the bench' }));
    server('round:closed', { roundIndex: 0 });
    expect(await screen.findByRole('heading', { level: 1, name: 'Round closed' })).toBeInTheDocument();
    expect(screen.getByText('Your answer: A. On the bench')).toBeInTheDocument();
    expect(screen.queryByText(/time's up/i)).not.toBeInTheDocument();
  });

  it("huddle: shows teammates' live votes beside options and locks in the shared vote", async () => {
    const { fake, user, server } = await startGame(sessionView({ status: 'running', format: 'huddle', round: round() }));
    server('round:votes', {
      roundIndex: 0,
      teamId: 't-argon',
      votes: [{ playerId: 'p-ada', response: { type: 'single', optionId: 'o-face' }, locked: false }],
    });
    expect(screen.getByRole('button', { name: 'B. On your face' })).toHaveAccessibleDescription('Ada');

    fake.respond('answer:submit', { ok: true, duplicate: false, locked: false, acceptedAt: 1 });
    await user.click(screen.getByRole('button', { name: 'B. On your face' }));
    expect(fake.commands('answer:submit')[0]).toMatchObject({ response: { optionId: 'o-face' }, lock: false });
    server('round:votes', {
      roundIndex: 0,
      teamId: 't-argon',
      votes: [
        { playerId: 'p-ada', response: { type: 'single', optionId: 'o-face' }, locked: true },
        { playerId: ME, response: { type: 'single', optionId: 'o-face' }, locked: false },
      ],
    });
    expect(screen.getByRole('button', { name: 'B. On your face' })).toHaveAccessibleDescription('Ada (locked), You');
    // The vote can still change before locking in.
    expect(screen.getByRole('button', { name: 'A. On the bench' })).toBeEnabled();

    fake.respond('answer:lock', { ok: true });
    await user.click(screen.getByRole('button', { name: 'Lock in' }));
    expect(fake.commands('answer:lock')).toEqual([{ roundIndex: 0 }]);
    expect(await screen.findByText(/Locked in: B\. On your face/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'A. On the bench' })).toBeDisabled();
  });

  it('numbered: only the called member sees answer controls', async () => {
    const { server } = await startGame(
      sessionView({ status: 'running', format: 'numbered', round: round({ calledPlayerId: 'p-ada' }) }),
    );
    expect(screen.getByText('Discuss with your team — Ada answers this one.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /On your face/ })).not.toBeInTheDocument();
    // The options are there to read while the team talks, with nothing to press.
    const preview = screen.getByRole('list', { name: 'Options to talk over' });
    expect(screen.queryByRole('list', { name: 'Options' })).not.toBeInTheDocument();
    expect(within(preview).getAllByRole('listitem').map((li) => li.textContent)).toContain('B. On your face');
    expect(within(preview).queryAllByRole('button')).toHaveLength(0);

    server('round:call', { roundIndex: 0, calledPlayerId: ME });
    expect(screen.getByRole('button', { name: 'B. On your face' })).toBeEnabled();
    expect(screen.queryByText(/Discuss with your team/)).not.toBeInTheDocument();
  });

  it('order: builds the sequence with up and down buttons and submits it', async () => {
    const { fake, user } = await startGame(sessionView({ status: 'running', round: round({ item: orderItem() }) }));
    fake.respond('answer:submit', ACCEPTED);
    // Shown: Tell, Stop, Warn. Wanted: Stop, Warn, Tell.
    expect(screen.getByRole('button', { name: 'Move "Tell the teacher" up' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: 'Move "Tell the teacher" down' }));
    expect(screen.getByRole('button', { name: 'Move "Tell the teacher" down' })).toHaveFocus();
    await user.click(screen.getByRole('button', { name: 'Move "Tell the teacher" down' }));
    expect(screen.getByText('Tell the teacher moved to position 3 of 3.')).toBeInTheDocument();

    const steps = within(screen.getByRole('list', { name: 'Steps, first to last' })).getAllByRole('listitem');
    expect(steps.map((li) => li.textContent)).toEqual([
      expect.stringContaining('Stop and step back'),
      expect.stringContaining('Warn people nearby'),
      expect.stringContaining('Tell the teacher'),
    ]);
    await user.click(screen.getByRole('button', { name: 'Submit answer' }));
    expect(fake.commands('answer:submit')[0]).toMatchObject({
      response: { type: 'order', sequence: ['s-stop', 's-warn', 's-tell'] },
    });
  });

  it('numeric: sends the typed text, with the unit hint beside a decimal keyboard', async () => {
    const { fake, user } = await startGame(sessionView({ status: 'running', round: round({ item: numericItem() }) }));
    fake.respond('answer:submit', ACCEPTED);
    const input = screen.getByLabelText('Your answer');
    expect(input).toHaveAttribute('inputmode', 'decimal');
    expect(input).toHaveAccessibleDescription('Unit: mol');
    expect(screen.getByRole('button', { name: 'Submit answer' })).toBeDisabled();

    await user.type(input, '0.50');
    await user.click(screen.getByRole('button', { name: 'Submit answer' }));
    expect(fake.commands('answer:submit')[0]).toMatchObject({ response: { type: 'numeric', text: '0.50' } });
  });

  it('shows the countdown corrected by the clock offset, and the paused state', async () => {
    const { server } = await startGame(sessionView({ status: 'running', round: round() }));
    // Server clock = device clock + offset; put the server 12 s before the deadline.
    act(() => useConnectionStore.getState().setOffset(timing().deadlineAt! - 12_000 - Date.now(), 20));
    await waitFor(() => expect(screen.getByRole('timer')).toHaveTextContent(/^1[12] s left$/));

    server('round:timing', timing({ paused: true, deadlineAt: 1_000_020_000, serverNow: 1_000_000_000 }));
    expect(screen.getByRole('timer')).toHaveTextContent('Paused by your teacher — 20 s left');
  });

  it('shows the result after the reveal: verdict in words, the right answer, the explanation, points', async () => {
    const { server } = await startGame(sessionView({ status: 'running', round: round() }));
    server('round:revealed', reveal());
    server('standings:update', { own: { rank: 2, points: 1840, teamCount: 6 }, standings: [] });

    expect(screen.getByRole('heading', { name: 'Incorrect' })).toHaveFocus();
    expect(screen.getByText('B. On your face')).toBeInTheDocument();
    expect(screen.getByText('Goggles stay on from the moment you enter until you leave.')).toBeInTheDocument();
    expect(screen.getByText('Your answer: A. On the bench')).toBeInTheDocument();
    expect(screen.getByText('Team points this round').nextSibling).toHaveTextContent('420');
    expect(screen.getByRole('region', { name: "Your team's standing" })).toHaveTextContent('Team Argon is 2nd of 6');
  });

  it('numbered: a teammate of the called member reads the team’s verdict, or that the team gave no answer', async () => {
    const numbered = sessionView({ status: 'running', format: 'numbered', round: round({ calledPlayerId: 'p-ada' }) });
    const { server } = await startGame(numbered);
    server('round:revealed', reveal({ you: null, team: { answer: { type: 'single', optionId: 'o-bench' }, correct: false, points: 0, unity: false } }));
    expect(screen.getByRole('heading', { name: "Your team's answer was not right" })).toBeInTheDocument();

    server('round:revealed', reveal({ roundIndex: 0, you: null, team: { answer: null, correct: null, points: 0, unity: false } }));
    expect(screen.getByRole('heading', { name: 'No answer from your team' })).toBeInTheDocument();
  });

  it('shows the end summary', async () => {
    await startGame(
      sessionView({ status: 'ended', summary: { answered: 8, correct: 6, points: 4210, itemCount: 10 } }),
    );
    expect(screen.getByRole('heading', { name: "That's the end of the review" })).toBeInTheDocument();
    expect(screen.getByText('Answered').nextSibling).toHaveTextContent('8 of 10');
    expect(screen.getByText('Correct').nextSibling).toHaveTextContent('6');
  });

  it('says the team’s points are "so far" after a round', async () => {
    const own = { rank: 2, points: 1840, teamCount: 6 };
    const { server } = await startGame(sessionView({ status: 'running', round: round() }));
    server('round:revealed', reveal());
    server('standings:update', { own, standings: [] });
    expect(screen.getByText('1,840 points so far')).toBeInTheDocument();
  });

  it('says the team’s points are final on the end summary', async () => {
    const own = { rank: 2, points: 1840, teamCount: 6 };
    await startGame(sessionView({ status: 'ended', ownStanding: own, summary: { answered: 2, correct: 1, points: 1500, itemCount: 2 } }));
    expect(screen.getByRole('region', { name: "Your team's standing" })).toHaveTextContent(/1,840 points$/);
  });

  it('shows the reconnect banner while the socket is down', async () => {
    const { fake, server } = await startGame(sessionView({ status: 'running', round: round() }));
    const banner = screen.getByRole('status', { name: '' });
    expect(banner).toHaveTextContent('');

    server('disconnect', 'transport close');
    expect(screen.getByText('Reconnecting… your answers are safe.')).toHaveAttribute('aria-live', 'polite');
    expect(screen.getByText('Reconnecting… your answers are safe.')).toHaveAttribute('role', 'status');

    fake.respond('session:resync', { ok: true, view: sessionView({ status: 'running', round: round() }) });
    server('connect');
    expect(screen.queryByText('Reconnecting… your answers are safe.')).not.toBeInTheDocument();
  });

  it('shows a calm message when the host removes the player', async () => {
    const { server } = await startGame(sessionView());
    server('player:removed', { message: 'Your teacher took you out of this session.' });
    expect(screen.getByRole('heading', { name: "You've left this session" })).toBeInTheDocument();
    expect(screen.getByText('Your teacher took you out of this session.')).toBeInTheDocument();
  });
});

describe('reload with a stored token', () => {
  it('goes straight back into the session without re-joining', async () => {
    localStorage.setItem(PLAYER_TOKEN_KEY, 'tok-stored');
    const fetchMock = (globalThis.fetch = vitestFetchSpy());
    const { fake, tokens } = installFakeSocket();

    expect(resumeStoredSession()).toBe(true);
    render(<App />);
    await waitFor(() => expect(tokens).toEqual(['tok-stored']));
    act(() => {
      fake.serverEmit('connect');
      fake.serverEmit('session:state', sessionView());
    });
    await flush();

    expect(
      await screen.findByRole('heading', { name: "You're in. Waiting for your teacher to start." }),
    ).toBeInTheDocument();
    expect(screen.queryByLabelText('Join code')).not.toBeInTheDocument();
    expect(fetchMock.calls).toBe(0);
  });

  it('shows the join form when there is no stored token', () => {
    expect(resumeStoredSession()).toBe(false);
    expect(useSessionStore.getState().phase).toBe('notJoined');
  });
});

function vitestFetchSpy() {
  const spy = Object.assign(
    async () => {
      spy.calls++;
      return new Response('{}');
    },
    { calls: 0 },
  );
  return spy;
}
