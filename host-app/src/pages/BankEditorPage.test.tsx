import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { BankDetailDto } from '@covalent/shared-types';
import { makeBankDetail, makeItem, makeMedia } from '@/test/authoringFactories';
import { makeApiError, makeMe } from '@/test/factories';
import { renderApp } from '@/test/renderApp';
import { sentBody, stubFetch, type FetchRoutes } from '@/test/stubFetch';
import { routes } from '@/routes';

const BANK_ID = '7b000000-0000-4000-8000-000000000001';
const itemsUrl = `/api/banks/${BANK_ID}/items`;

function openBank(bank: BankDetailDto, extra: FetchRoutes = {}) {
  const fetchMock = stubFetch({
    'GET /api/me': { status: 200, body: makeMe() },
    [`GET /api/banks/${BANK_ID}`]: { status: 200, body: bank },
    [`POST ${itemsUrl}`]: (body) => ({ status: 201, body: makeItem({ id: '1e000000-0000-4000-8000-0000000000ff', ...(body as object) }) }),
    ...extra,
  });
  renderApp(routes.bank.build(BANK_ID));
  return { fetchMock, user: userEvent.setup() };
}

async function startItem(user: ReturnType<typeof userEvent.setup>, typeLabel: string) {
  await user.click(await screen.findByRole('button', { name: 'New item' }));
  await user.selectOptions(screen.getByLabelText('Question type'), typeLabel);
}

describe('BankEditorPage', () => {
  it('builds a numeric item with value, unit, relative tolerance and significant figures', async () => {
    const { fetchMock, user } = openBank(makeBankDetail());
    await startItem(user, 'Numeric');
    await user.type(screen.getByLabelText('Prompt'), 'What is the density of the block?');
    await user.type(screen.getByLabelText('Correct value'), '2.80');
    await user.type(screen.getByLabelText('Unit'), 'g/mL');
    await user.selectOptions(screen.getByLabelText('Tolerance kind'), 'relative');
    await user.type(screen.getByLabelText('Tolerance'), '0.02');
    await user.type(screen.getByLabelText('Significant figures (optional)'), '3');
    await user.type(screen.getByLabelText('Tags'), 'density, sig-figs');
    await user.click(screen.getByRole('button', { name: 'Add item' }));

    expect(await screen.findByRole('button', { name: 'Edit item 1' })).toBeInTheDocument();
    expect(sentBody(fetchMock, 'POST', itemsUrl)).toEqual({
      type: 'numeric',
      prompt: 'What is the density of the block?',
      options: [],
      key: { type: 'numeric', value: '2.80', unit: 'g/mL', tolerance: { kind: 'relative', value: 0.02 }, sigFigs: 3 },
      explanation: '',
      tags: ['density', 'sig-figs'],
      imageId: null,
    });
  });

  it('builds an order item from its steps in the order the author arranged them', async () => {
    const { fetchMock, user } = openBank(makeBankDetail());
    await startItem(user, 'Put in order');
    await user.type(screen.getByLabelText('Prompt'), 'Light a burner');
    await user.type(screen.getByLabelText('Step 1'), 'Check the hose');
    await user.type(screen.getByLabelText('Step 2'), 'Light the striker');
    await user.type(screen.getByLabelText('Step 3'), 'Open the gas tap');
    await user.click(screen.getByRole('button', { name: 'Move step 3 up' }));
    await user.click(screen.getByRole('button', { name: 'Add item' }));

    await screen.findByRole('button', { name: 'Edit item 1' });
    const body = sentBody(fetchMock, 'POST', itemsUrl) as { options: unknown; key: unknown };
    expect(body.options).toEqual([{ text: 'Check the hose' }, { text: 'Open the gas tap' }, { text: 'Light the striker' }]);
    expect(body.key).toEqual({ type: 'order', sequence: ['#0', '#1', '#2'] });
  });

  it('builds a multi item with two correct options, and a removed option leaves the list', async () => {
    const { fetchMock, user } = openBank(makeBankDetail());
    await startItem(user, 'Multiple answers');
    await user.type(screen.getByLabelText('Prompt'), 'Which go in the glass box?');
    await user.type(screen.getByLabelText('Option A'), 'Cracked beaker');
    await user.type(screen.getByLabelText('Option B'), 'Paper towels');
    await user.type(screen.getByLabelText('Option C'), 'Chipped test tube');
    await user.click(screen.getByRole('button', { name: 'Remove option D' }));
    await user.click(screen.getByRole('checkbox', { name: 'Option A is correct' }));
    await user.click(screen.getByRole('checkbox', { name: 'Option C is correct' }));
    await user.click(screen.getByRole('button', { name: 'Add item' }));

    await screen.findByRole('button', { name: 'Edit item 1' });
    const body = sentBody(fetchMock, 'POST', itemsUrl) as { options: unknown; key: unknown };
    expect(body.options).toEqual([{ text: 'Cracked beaker' }, { text: 'Paper towels' }, { text: 'Chipped test tube' }]);
    expect(body.key).toEqual({ type: 'multi', correctOptionIds: ['#0', '#2'] });
  });

  it('places the server’s field errors beside the fields they name and keeps the form open', async () => {
    const error = makeApiError('validation_failed', '3 fields need attention.', [
      { field: 'options[1].text', message: 'Option B is empty: write its text.' },
      { field: 'key.correctOptionId', message: 'Mark exactly one of the options as the correct answer.' },
      { field: 'prompt', message: 'Write the question prompt.' },
    ]);
    const { user } = openBank(makeBankDetail(), { [`POST ${itemsUrl}`]: { status: 400, body: error } });
    await startItem(user, 'Single answer');
    await user.type(screen.getByLabelText('Option A'), 'Goggles on');
    await user.click(screen.getByRole('button', { name: 'Add item' }));

    expect(await screen.findByLabelText('Option B')).toHaveAccessibleDescription('Option B is empty: write its text.');
    expect(screen.getByLabelText('Option B')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Option A')).not.toHaveAttribute('aria-invalid');
    expect(screen.getByLabelText('Prompt')).toHaveAccessibleDescription('Write the question prompt.');
    expect(screen.getByText('Mark exactly one of the options as the correct answer.')).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('3 fields need attention.');
  });

  it('places numeric key errors beside unit and tolerance', async () => {
    const error = makeApiError('validation_failed', '2 fields need attention.', [
      { field: 'key.unit', message: 'The unit "gallonz" is not recognised.' },
      { field: 'key.tolerance.value', message: 'The tolerance must be zero or a positive number.' },
    ]);
    const { user } = openBank(makeBankDetail(), { [`POST ${itemsUrl}`]: { status: 400, body: error } });
    await startItem(user, 'Numeric');
    await user.click(screen.getByRole('button', { name: 'Add item' }));

    expect(await screen.findByLabelText('Unit')).toHaveAccessibleDescription(/not recognised/);
    expect(screen.getByLabelText('Tolerance')).toHaveAccessibleDescription(/zero or a positive number/);
    expect(screen.getByLabelText('Correct value')).not.toHaveAttribute('aria-invalid');
  });

  it('previews options lettered A, B, C… in one neutral style, and a numeric answer with its unit beside it', async () => {
    const { user } = openBank(makeBankDetail());
    await startItem(user, 'Single answer');
    await user.type(screen.getByLabelText('Prompt'), 'Where do bags go?');
    await user.type(screen.getByLabelText('Option A'), 'Under the bench');
    await user.type(screen.getByLabelText('Option B'), 'By the door');
    await user.type(screen.getByLabelText('Option C'), 'On the bench');

    const preview = screen.getByRole('region', { name: 'Student preview' });
    expect(within(preview).getByText('Where do bags go?')).toBeInTheDocument();
    const options = within(within(preview).getByRole('list', { name: 'Options as students see them' })).getAllByRole('listitem');
    expect(options.map((li) => li.textContent)).toEqual(['AUnder the bench', 'BBy the door', 'COn the bench', 'D(empty)']);
    // One look for all: the same class and no per-option inline colour.
    expect(new Set(options.map((li) => li.className)).size).toBe(1);
    options.forEach((li) => expect(li).not.toHaveAttribute('style'));
    // The preview never gives the key away.
    await user.click(screen.getByRole('radio', { name: 'Option B is correct' }));
    expect(within(preview).queryByText(/correct/i)).not.toBeInTheDocument();

    await user.selectOptions(screen.getByLabelText('Question type'), 'Numeric');
    await user.type(screen.getByLabelText('Unit'), 'mL');
    expect(within(preview).getByRole('textbox', { name: 'Answer (preview)' })).toBeInTheDocument();
    expect(within(preview).getByText('mL')).toBeInTheDocument();
  });

  it('uploads an image, shows its thumbnail and saves the item with the image id', async () => {
    const media = makeMedia();
    const { fetchMock, user } = openBank(makeBankDetail(), { 'POST /api/media/images': { status: 201, body: media } });
    await startItem(user, 'True or false');
    await user.type(screen.getByLabelText('Prompt'), 'This label means flammable.');
    await user.click(screen.getByRole('radio', { name: 'True' }));
    await user.upload(screen.getByLabelText('Image (optional)'), new File([new Uint8Array([137, 80, 78, 71])], 'label.png', { type: 'image/png' }));

    expect(await screen.findByRole('img', { name: "Thumbnail of the item's image" })).toHaveAttribute('src', media.url);
    await user.click(screen.getByRole('button', { name: 'Add item' }));
    await screen.findByRole('button', { name: 'Edit item 1' });
    expect(sentBody(fetchMock, 'POST', itemsUrl)).toMatchObject({ type: 'truefalse', key: { type: 'truefalse', value: true }, imageId: media.id });
  });

  it('moves an item up with a keyboard-reachable button and sends the new order', async () => {
    const first = makeItem({ id: '1e000000-0000-4000-8000-00000000000a', prompt: 'First' });
    const second = makeItem({ id: '1e000000-0000-4000-8000-00000000000b', prompt: 'Second', position: 1 });
    const { fetchMock, user } = openBank(makeBankDetail({ items: [first, second] }), {
      [`PUT /api/banks/${BANK_ID}/items/order`]: { status: 200, body: [{ ...second, position: 0 }, { ...first, position: 1 }] },
    });
    const moveUp = await screen.findByRole('button', { name: 'Move item 2 up' });
    expect(screen.getByRole('button', { name: 'Move item 1 up' })).toBeDisabled();
    moveUp.focus();
    await user.keyboard('{Enter}');

    const list = await screen.findByRole('list', { name: 'Items' });
    await within(list).findByText('Second');
    expect(sentBody(fetchMock, 'PUT', `/api/banks/${BANK_ID}/items/order`)).toEqual({ itemIds: [second.id, first.id] });
    expect(within(list).getAllByRole('listitem')[0]).toHaveTextContent('Second');
    expect(screen.getByRole('status', { hidden: true })).toHaveTextContent('to position 1 of 2');
  });

  it('is read-only for a view share: no adding, moving or saving, and the form’s fields are disabled', async () => {
    const { user } = openBank(makeBankDetail({ access: 'view', ownerName: 'Maja Lindqvist', items: [makeItem()] }));
    await user.click(await screen.findByRole('button', { name: 'View item 1' }));

    expect(screen.queryByRole('button', { name: 'New item' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /move item/i })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save item' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Share' })).not.toBeInTheDocument();
    expect(screen.getByLabelText('Prompt')).toBeDisabled();
    expect(screen.getByLabelText('Option B')).toHaveValue('On the shelf by the door');
    expect(screen.getByLabelText('Title')).toBeDisabled();
    expect(screen.getByRole('link', { name: 'Export CSV' })).toHaveAttribute('href', `/api/banks/${BANK_ID}/export`);
  });

  it('shows the lab-safety caution only on banks with safety tags', async () => {
    openBank(makeBankDetail({ items: [makeItem({ tags: ['safety', 'goggles'] })] }));
    expect(await screen.findByRole('note')).toHaveTextContent(/never replace them/);
  });

  it('shows no caution on a bank without safety tags', async () => {
    openBank(makeBankDetail({ title: 'Class norms', tags: ['norms'], items: [makeItem()] }));
    await screen.findByRole('button', { name: 'Edit item 1' });
    expect(screen.queryByRole('note')).not.toBeInTheDocument();
  });

  it('shares the bank by e-mail with edit access', async () => {
    const shared = makeBankDetail({ shares: [{ userId: 'u2', displayName: 'Tomás Reyes', email: 't.reyes@school.example', access: 'edit' }] });
    const { fetchMock, user } = openBank(makeBankDetail(), { [`POST /api/banks/${BANK_ID}/shares`]: { status: 200, body: shared } });
    await user.click(await screen.findByRole('button', { name: 'Share' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText("Colleague's school e-mail"), 't.reyes@school.example');
    await user.selectOptions(within(dialog).getByLabelText('Access'), 'edit');
    await user.click(within(dialog).getByRole('button', { name: 'Share' }));

    expect(await within(dialog).findByText(/Tomás Reyes/)).toHaveTextContent('Can edit');
    expect(sentBody(fetchMock, 'POST', `/api/banks/${BANK_ID}/shares`)).toEqual({ email: 't.reyes@school.example', access: 'edit' });
  });
});
