import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { CatchupAnswerResponse, CatchupItemView, CatchupStartResponse } from '@covalent/shared-types';
import { App } from '@/app/App';
import { jsonResponse, visit } from '@/test/factories';
import { CatchupPage } from './CatchupPage';

const DAY = 86_400_000;
const later = (days: number) => new Date(Date.now() + days * DAY).toISOString();

// Catch-up test data, invented.
const TRUE_FALSE: CatchupItemView = { itemId: 'item-tf', box: 1, type: 'truefalse', prompt: 'Bags go under the bench.', options: [], unitHint: null, imageUrl: null };
const SINGLE: CatchupItemView = {
  itemId: 'item-single',
  box: 1,
  type: 'single',
  prompt: 'Which glassware delivers 10.0 mL most precisely?',
  options: [
    { id: 'o-beaker', text: 'Beaker' },
    { id: 'o-pipette', text: 'Volumetric pipette' },
  ],
  unitHint: null,
  imageUrl: null,
};
const INFO = { ok: true, title: 'Lab entry & exit procedures', students: [{ rosterEntryId: 'r-ana', displayName: 'Ana P.' }, { rosterEntryId: 'r-ben', displayName: 'Ben Q.' }] };
const start = (items: CatchupItemView[], nextDueAt: string | null = later(0)): CatchupStartResponse => ({ ok: true, token: 'tok', displayName: 'Ben Q.', title: INFO.title, items, nextDueAt });
const RIGHT: CatchupAnswerResponse = { ok: true, credit: 1, correct: true, key: { type: 'truefalse', value: false }, explanation: 'Aisles stay clear.', box: 2, dueAt: later(2), nextDueAt: later(0) };
const WRONG: CatchupAnswerResponse = {
  ok: true,
  credit: 0,
  correct: false,
  key: { type: 'single', correctOptionId: 'o-pipette' },
  explanation: 'It is calibrated to one volume.',
  box: 1,
  dueAt: later(1),
  nextDueAt: later(1),
};

/** Routes the page's three calls; answers are given in order. */
function stubCatchupApi(opts: { info?: [number, unknown]; start?: [number, unknown]; answers?: [number, unknown][] } = {}) {
  const answers = [...(opts.answers ?? [])];
  const fetchMock = vi.fn(async (url: string, _init?: RequestInit) => {
    if (url.endsWith('/answers')) return jsonResponse(...(answers.shift() ?? [500, {}]));
    if (url.endsWith('/start')) return jsonResponse(...(opts.start ?? [200, start([TRUE_FALSE])]));
    return jsonResponse(...(opts.info ?? [200, INFO]));
  });
  vi.stubGlobal('fetch', fetchMock);
  const bodies = (suffix: string) => fetchMock.mock.calls.filter(([url]) => url.endsWith(suffix)).map(([, init]) => JSON.parse(String(init?.body)));
  return { fetchMock, bodies };
}

beforeEach(() => {
  visit('/play/catchup/abc234');
});

describe(CatchupPage.name, () => {
  it('opens from a /play/catchup/<code> link and lists the names with items to catch up on', async () => {
    const { fetchMock } = stubCatchupApi();
    render(<App />);
    expect(await screen.findByRole('heading', { name: 'Catch-up' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'Ana P.' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'Ben Q.' })).toBeInTheDocument();
    expect(fetchMock.mock.calls[0]?.[0]).toBe('/api/play/catchups/ABC234');
  });

  it('plays each due item with feedback, then says how many were right and when to come back', async () => {
    const { bodies } = stubCatchupApi({ start: [200, start([TRUE_FALSE, SINGLE])], answers: [[200, RIGHT], [200, WRONG]] });
    const user = userEvent.setup();
    render(<CatchupPage />);

    await user.click(await screen.findByRole('radio', { name: 'Ben Q.' }));
    await user.click(screen.getByRole('button', { name: 'Start' }));
    expect(bodies('/start')).toEqual([{ rosterEntryId: 'r-ben' }]);

    expect(await screen.findByRole('heading', { name: 'Bags go under the bench.' })).toBeInTheDocument();
    expect(screen.getByText('Item 1 of 2')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Check answer' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: /False/ }));
    await user.click(screen.getByRole('button', { name: 'Check answer' }));
    expect(await screen.findByRole('heading', { name: /Correct/ })).toBeInTheDocument();
    expect(screen.getByText('Aisles stay clear.')).toBeInTheDocument();
    expect(screen.getByText('Your answer: False')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next item' }));

    await user.click(await screen.findByRole('button', { name: /Beaker/ }));
    await user.click(screen.getByRole('button', { name: 'Check answer' }));
    expect(await screen.findByRole('heading', { name: /Incorrect/ })).toBeInTheDocument();
    expect(screen.getByText('B. Volumetric pipette')).toBeInTheDocument();
    expect(screen.getByText(/^Your answer: [A-D]\. Beaker$/)).toBeInTheDocument();
    expect(screen.getByText('It is calibrated to one volume.')).toBeInTheDocument();
    expect(bodies('/answers')).toEqual([
      { token: 'tok', itemId: 'item-tf', response: { type: 'truefalse', value: false } },
      { token: 'tok', itemId: 'item-single', response: { type: 'single', optionId: 'o-beaker' } },
    ]);

    await user.click(screen.getByRole('button', { name: 'See how you did' }));
    expect(await screen.findByText('1 of 2 right; next review tomorrow.')).toBeInTheDocument();
  });

  it('counts days to the next review when every item was right', async () => {
    stubCatchupApi({ answers: [[200, { ...RIGHT, nextDueAt: later(2) }]] });
    const user = userEvent.setup();
    render(<CatchupPage />);
    await user.click(await screen.findByRole('radio', { name: 'Ben Q.' }));
    await user.click(screen.getByRole('button', { name: 'Start' }));
    await user.click(await screen.findByRole('button', { name: /False/ }));
    await user.click(screen.getByRole('button', { name: 'Check answer' }));
    await user.click(await screen.findByRole('button', { name: 'See how you did' }));
    expect(await screen.findByText('1 of 1 right; next review in 2 days.')).toBeInTheDocument();
  });

  it('shows the server message when an answer is refused, and keeps the item', async () => {
    const refused = { ok: false, error: 'card_not_due', message: 'Not due yet: this item comes back for review on 2026-12-03.' };
    stubCatchupApi({ answers: [[409, refused]] });
    const user = userEvent.setup();
    render(<CatchupPage />);
    await user.click(await screen.findByRole('radio', { name: 'Ben Q.' }));
    await user.click(screen.getByRole('button', { name: 'Start' }));
    await user.click(await screen.findByRole('button', { name: /True/ }));
    await user.click(screen.getByRole('button', { name: 'Check answer' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(refused.message);
    expect(screen.getByRole('heading', { name: 'Bags go under the bench.' })).toBeInTheDocument();
  });

  it('asks for a name before starting', async () => {
    const { fetchMock } = stubCatchupApi();
    const user = userEvent.setup();
    render(<CatchupPage />);
    await user.click(await screen.findByRole('button', { name: 'Start' }));
    expect(screen.getByRole('alert')).toHaveTextContent('Pick your name to start.');
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it('says when nothing is due yet', async () => {
    stubCatchupApi({ start: [200, start([], later(4))] });
    const user = userEvent.setup();
    render(<CatchupPage />);
    await user.click(await screen.findByRole('radio', { name: 'Ben Q.' }));
    await user.click(screen.getByRole('button', { name: 'Start' }));
    expect(await screen.findByRole('heading', { name: 'Nothing due right now' })).toBeInTheDocument();
    expect(screen.getByText('Next review in 4 days.')).toBeInTheDocument();
  });

  it('shows why an unknown code cannot be opened', async () => {
    stubCatchupApi({ info: [404, { ok: false, error: 'unknown_code', message: 'No catch-up has that code.' }] });
    render(<CatchupPage />);
    expect(await screen.findByRole('alert')).toHaveTextContent('No catch-up has that code.');
  });
});
