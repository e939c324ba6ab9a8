import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { PLAYER_TOKEN_KEY } from '@/realtime';
import { useSessionStore } from '@/stores/useSessionStore';
import {
  joinInfo,
  joinSuccess,
  jsonResponse,
  stubApi,
  stubFetch,
  stubPendingFetch,
  UNKNOWN_CODE_FAILURE,
  visit,
} from '@/test/factories';
import { installFakeSocket } from '@/test/fakeSocket';
import { JoinPage } from './JoinPage';

function renderPage() {
  const user = userEvent.setup();
  render(<JoinPage />);
  return {
    user,
    codeField: () => screen.getByLabelText('Join code'),
    nicknameField: () => screen.getByLabelText('Nickname'),
    joinButton: () => screen.getByRole('button', { name: /join/i }),
  };
}

beforeEach(() => {
  visit('/play/');
  useSessionStore.getState().reset();
  stubApi();
});

describe(JoinPage.name, () => {
  it('labels both fields and shows the privacy hint and note', () => {
    const { codeField, nicknameField } = renderPage();
    expect(codeField()).toHaveValue('');
    expect(nicknameField()).toHaveAccessibleDescription(
      'First name or a nickname — no surnames or e-mail addresses',
    );
    expect(
      screen.getByText(
        'Covalent keeps only your nickname and your answers for this class. Your school decides how long.',
      ),
    ).toBeInTheDocument();
  });

  it('shows typed code characters in upper case', async () => {
    const { user, codeField } = renderPage();
    await user.type(codeField(), 'abc234');
    expect(codeField()).toHaveValue('ABC234');
  });

  it('shows an error beside each invalid field and does not submit', async () => {
    const fetchMock = stubFetch(200, joinSuccess());
    const { user, codeField, nicknameField, joinButton } = renderPage();

    await user.type(codeField(), 'ABC10');
    await user.click(joinButton());

    const alerts = screen.getAllByRole('alert');
    expect(alerts).toHaveLength(2);
    expect(codeField()).toHaveAttribute('aria-invalid', 'true');
    expect(codeField()).toHaveAccessibleDescription(expect.stringContaining('never use 0, O, 1, I or L'));
    expect(nicknameField()).toHaveAccessibleDescription(expect.stringContaining('Enter a nickname.'));
    expect(codeField()).toHaveFocus();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('clears a field error once that field is edited', async () => {
    stubFetch(200, joinSuccess());
    const { user, nicknameField, codeField, joinButton } = renderPage();
    await user.type(codeField(), 'ABC234');
    await user.click(joinButton());
    expect(screen.getByRole('alert')).toHaveTextContent('Enter a nickname.');

    await user.type(nicknameField(), 'S');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('pre-fills the code from ?code= and moves focus to the nickname', () => {
    visit('/play/?code=abc234');
    const { codeField, nicknameField } = renderPage();
    expect(codeField()).toHaveValue('ABC234');
    expect(nicknameField()).toHaveFocus();
  });

  it('pre-fills the code from /play/join/<code>', () => {
    visit('/play/join/ABC234');
    const { codeField } = renderPage();
    expect(codeField()).toHaveValue('ABC234');
  });

  it('sends the normalised code and trimmed nickname', async () => {
    const { joinCalls } = stubApi();
    const { user, codeField, nicknameField, joinButton } = renderPage();
    await user.type(codeField(), 'abc-234');
    await user.type(nicknameField(), '  Sam  ');
    await user.click(joinButton());

    await waitFor(() => expect(joinCalls()).toHaveLength(1));
    const init = joinCalls()[0]?.[1];
    expect(JSON.parse(init?.body as string)).toEqual({ code: 'ABC234', nickname: 'Sam' });
  });

  it('looks the code up once it is valid and shows the session title', async () => {
    const { fetchMock } = stubApi();
    const { user, codeField } = renderPage();
    await user.type(codeField(), 'abc23');
    expect(fetchMock).not.toHaveBeenCalled();
    await user.type(codeField(), '4');
    expect(await screen.findByText('Session: Lab entry & exit procedures')).toBeInTheDocument();
    expect(fetchMock.mock.calls[0]?.[0]).toBe('/api/play/sessions/ABC234');
  });

  it('offers the class roster, with taken names disabled, and joins by roster entry', async () => {
    const roster = [
      { id: 'r-1', displayName: 'Amara O.', taken: false },
      { id: 'r-2', displayName: 'Ben T.', taken: true },
    ];
    const { joinCalls } = stubApi({ info: [200, joinInfo({ roster })] });
    const { fake, tokens } = installFakeSocket();
    const { user, codeField, joinButton } = renderPage();
    await user.type(codeField(), 'ABC234');

    const group = await screen.findByRole('group', { name: 'Pick your name' });
    expect(group).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: /Ben T\./ })).toBeDisabled();
    expect(screen.queryByLabelText('Nickname')).not.toBeInTheDocument();

    await user.click(joinButton());
    expect(screen.getByRole('alert')).toHaveTextContent('Pick your name from the list.');

    await user.click(screen.getByRole('radio', { name: 'Amara O.' }));
    await user.click(joinButton());
    await waitFor(() => expect(joinCalls()).toHaveLength(1));
    expect(JSON.parse(joinCalls()[0]?.[1]?.body as string)).toEqual({ code: 'ABC234', rosterEntryId: 'r-1' });
    await waitFor(() => expect(tokens).toEqual(['player-token-abc']));
    expect(fake.connectCalls).toBe(1);
    expect(useSessionStore.getState().nickname).toBe('Amara O.');
  });

  it('lets a rostered class member use a nickname instead', async () => {
    stubApi({ info: [200, joinInfo({ roster: [{ id: 'r-1', displayName: 'Amara O.', taken: false }] })] });
    const { user, codeField } = renderPage();
    await user.type(codeField(), 'ABC234');
    await user.click(await screen.findByRole('radio', { name: 'Use a nickname' }));
    expect(screen.getByLabelText('Nickname')).toBeInTheDocument();
  });

  it("shows the server's message when the join is refused", async () => {
    stubFetch(404, UNKNOWN_CODE_FAILURE);
    const { user, codeField, nicknameField, joinButton } = renderPage();
    await user.type(codeField(), 'ABC234');
    await user.type(nicknameField(), 'Sam');
    await user.click(joinButton());

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'No session has that code. Check the code on the board.',
    );
    expect(joinButton()).toBeEnabled();
    expect(localStorage.getItem(PLAYER_TOKEN_KEY)).toBeNull();
    expect(useSessionStore.getState().phase).toBe('notJoined');
  });

  it('disables the button while the join is in flight', async () => {
    const { respond } = stubPendingFetch();
    const { user, codeField, nicknameField, joinButton } = renderPage();
    await user.type(codeField(), 'ABC234');
    await user.type(nicknameField(), 'Sam');
    await user.click(joinButton());

    expect(joinButton()).toBeDisabled();
    expect(joinButton()).toHaveTextContent('Joining…');

    respond(jsonResponse(404, UNKNOWN_CODE_FAILURE));
    await waitFor(() => expect(joinButton()).toBeEnabled());
  });

  it('stores the token and connects the socket with it on success', async () => {
    stubFetch(200, joinSuccess({ playerToken: 'tok-123', sessionId: 'sess-1' }));
    const { tokens } = installFakeSocket();
    const { user, codeField, nicknameField, joinButton } = renderPage();
    await user.type(codeField(), 'ABC234');
    await user.type(nicknameField(), 'Sam');
    await user.click(joinButton());

    await waitFor(() => expect(tokens).toEqual(['tok-123']));
    expect(localStorage.getItem(PLAYER_TOKEN_KEY)).toBe('tok-123');
    expect(useSessionStore.getState()).toMatchObject({
      phase: 'joined',
      sessionId: 'sess-1',
      playerToken: 'tok-123',
      nickname: 'Sam',
    });
  });
});
