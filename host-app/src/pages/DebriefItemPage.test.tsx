import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SESSION_ID, makeDebriefItem, noFig } from '@/features/debrief/testing/debriefFactories';
import { routes } from '@/routes';
import { makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { stubFetch } from '@/test/stubFetch';

const ITEM_ID = '7c1e0a00-0000-4000-8000-0000000000i1';

function renderItem(item = makeDebriefItem()) {
  stubFetch({
    'GET /api/me': { status: 200, body: makeMe() },
    [`GET /api/sessions/${SESSION_ID}/debrief/items/${ITEM_ID}`]: { status: 200, body: item },
  });
  renderApp(routes.debriefItem.build(SESSION_ID, ITEM_ID));
}

describe('DebriefItemPage', () => {
  it('shows the prompt, key, explanation and figures', async () => {
    renderItem(makeDebriefItem({ flags: ['possibleMiskey'] }));
    expect(await screen.findByText('Which glassware measures 25.00 mL most accurately?')).toBeInTheDocument();
    expect(screen.getByText('B. Volumetric pipette', { selector: '.rt-DataListValue' })).toBeInTheDocument();
    expect(screen.getByText('A volumetric pipette delivers one fixed volume to ±0.03 mL.')).toBeInTheDocument();
    expect(screen.getByText('0.35')).toBeInTheDocument();
    expect(screen.getByText('possible mis-key')).toBeInTheDocument();
  });

  it('marks the key and non-functional distractors in words, with shares as percentages', async () => {
    renderItem();
    const table = await screen.findByRole('table', { name: 'Distractor analysis' });
    const keyRow = within(table).getByRole('row', { name: /^B/ });
    expect(keyRow).toHaveTextContent('Volumetric pipette');
    expect(keyRow).toHaveTextContent('key');
    expect(keyRow).toHaveTextContent('50.0%');
    expect(keyRow).toHaveTextContent('80.0%');
    expect(keyRow).toHaveTextContent('40.0%');
    const flask = within(table).getByRole('row', { name: /^D/ });
    expect(flask).toHaveTextContent('non-functional');
    expect(flask).not.toHaveTextContent(/\bkey\b/);
    const beaker = within(table).getByRole('row', { name: /^A/ });
    expect(beaker).not.toHaveTextContent('non-functional');
    expect(beaker).not.toHaveTextContent(/\bkey\b/);
  });

  it('says why there is no distractor table for a non-choice item', async () => {
    renderItem(makeDebriefItem({ type: 'numeric', distractors: noFig('not a choice item') }));
    expect(await screen.findByText('Not enough data: not a choice item')).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Distractor analysis' })).not.toBeInTheDocument();
  });
});
