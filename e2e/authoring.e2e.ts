import { expect, test, type Page } from '@playwright/test';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';
import { demoTeacher } from './fixtures';

const fixtures = join(__dirname, '../fixtures/csv');

/** CRC-32 (ISO 3309, as the PNG specification requires for each chunk). */
function crc32(bytes: Buffer): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k++) crc = crc & 1 ? (crc >>> 1) ^ 0xedb88320 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A valid 2×2 teal RGB PNG, built here so the server's content sniffing sees a real image. */
function tinyPng(): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(2, 0); // width
  header.writeUInt32BE(2, 4); // height
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: RGB
  const row = Buffer.from([0, 0x0f, 0x76, 0x6e, 0x0f, 0x76, 0x6e]); // filter byte + two pixels
  const pixels = deflateSync(Buffer.concat([row, row]));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel(/e-mail/i).fill(demoTeacher.email);
  await page.getByLabel(/^password/i).fill(demoTeacher.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
}

/** Opens a new item form of one type with its prompt written. */
async function newItem(page: Page, type: string, prompt: string) {
  await page.getByRole('button', { name: 'New item' }).click();
  await page.getByLabel('Question type').selectOption({ label: type });
  await page.getByLabel('Prompt').fill(prompt);
}

async function addItem(page: Page, expectedCount: number) {
  await page.getByRole('button', { name: 'Add item', exact: true }).click();
  await expect(page.getByRole('list', { name: 'Items' }).getByRole('listitem')).toHaveCount(expectedCount);
}

test.describe('teacher preparation', () => {
  test('creates a bank and writes one item of each type, one with an image', async ({ page }) => {
    const title = `E2E bank ${Date.now()}`;
    await signIn(page);
    await page.getByRole('navigation').getByRole('link', { name: 'Banks' }).click();
    await page.getByLabel('New bank title').fill(title);
    await page.getByRole('button', { name: 'Create bank' }).click();
    await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();

    await newItem(page, 'Single answer', 'Which glassware measures 25.0 mL most precisely?');
    await page.getByLabel('Option A', { exact: true }).fill('Beaker');
    await page.getByLabel('Option B', { exact: true }).fill('Volumetric pipette');
    await page.getByRole('button', { name: 'Remove option D' }).click();
    await page.getByRole('button', { name: 'Remove option C' }).click();
    await page.getByRole('radio', { name: 'Option B is correct' }).check();
    // The student preview letters the options.
    const preview = page.getByRole('region', { name: 'Student preview' });
    await expect(preview.getByRole('listitem')).toHaveText(['ABeaker', 'BVolumetric pipette']);
    await page.getByLabel('Image (optional)').setInputFiles({ name: 'pipette.png', mimeType: 'image/png', buffer: tinyPng() });
    await expect(page.getByRole('img', { name: "Thumbnail of the item's image" })).toBeVisible();
    await addItem(page, 1);

    await newItem(page, 'Multiple answers', 'Which belong in the broken-glass box?');
    await page.getByLabel('Option A', { exact: true }).fill('A cracked beaker');
    await page.getByLabel('Option B', { exact: true }).fill('Paper towels');
    await page.getByLabel('Option C', { exact: true }).fill('A chipped test tube');
    await page.getByLabel('Option D', { exact: true }).fill('Used gloves');
    await page.getByRole('checkbox', { name: 'Option A is correct' }).check();
    await page.getByRole('checkbox', { name: 'Option C is correct' }).check();
    await page.getByLabel('Tags', { exact: true }).fill('safety, disposal');
    await addItem(page, 2);
    // A safety-tagged item brings the calm caution.
    await expect(page.getByRole('note')).toContainText('never replace them');

    await newItem(page, 'True or false', 'Goggles may be pushed up while you write notes.');
    await page.getByRole('radio', { name: 'False' }).check();
    await addItem(page, 3);

    await newItem(page, 'Put in order', 'Put the steps for lighting a burner in order.');
    await page.getByLabel('Step 1', { exact: true }).fill('Check the hose is attached');
    await page.getByLabel('Step 2', { exact: true }).fill('Close the air hole');
    await page.getByLabel('Step 3', { exact: true }).fill('Light the striker');
    await page.getByRole('button', { name: 'Add step' }).click();
    await page.getByLabel('Step 4', { exact: true }).fill('Open the gas tap slowly');
    await addItem(page, 4);

    await newItem(page, 'Numeric', 'A block of 12.6 g fills 4.50 mL. What is its density?');
    await page.getByLabel('Correct value').fill('2.80');
    await page.getByLabel('Unit').fill('g/mL');
    await page.getByLabel('Tolerance', { exact: true }).fill('0.01');
    await page.getByLabel('Significant figures (optional)').fill('3');
    await expect(page.getByRole('region', { name: 'Student preview' })).toContainText('g/mL');
    await addItem(page, 5);

    await newItem(page, 'Short text', 'Where do you rinse your eyes after a splash?');
    await page.getByLabel('Accepted answers').fill('eyewash station\neyewash');
    await page.getByText('Accept one typo').click();
    await addItem(page, 6);

    // A bad unit comes back from the server beside the Unit field, and nothing is added.
    await newItem(page, 'Numeric', 'How much?');
    await page.getByLabel('Correct value').fill('1.0');
    await page.getByLabel('Unit').fill('gallonzz');
    await page.getByRole('button', { name: 'Add item', exact: true }).click();
    await expect(page.getByLabel('Unit')).toHaveAttribute('aria-invalid', 'true');
    await expect(page.getByLabel('Unit')).toHaveAccessibleDescription(/"gallonzz" is not recognised/);
    await page.getByRole('button', { name: 'Cancel' }).click();
    await expect(page.getByRole('list', { name: 'Items' }).getByRole('listitem')).toHaveCount(6);

    // Reorder with the keyboard: item 6 moves up one place.
    await page.getByRole('button', { name: 'Move item 6 up' }).focus();
    await page.keyboard.press('Enter');
    await expect(page.getByRole('list', { name: 'Items' }).getByRole('listitem').nth(4)).toContainText('rinse your eyes');

    // What the server stored: six items, the first with its image, the numeric key exact.
    const bankUrl = page.url();
    const bankId = bankUrl.split('/').pop()!;
    const stored = await (await page.request.get(`/api/banks/${bankId}`)).json();
    expect(stored.items).toHaveLength(6);
    expect(stored.items[0].imageId).toEqual(expect.any(String));
    expect(stored.items.map((i: { type: string }) => i.type)).toEqual(['single', 'multi', 'truefalse', 'order', 'text', 'numeric']);
    const numeric = stored.items.find((i: { type: string }) => i.type === 'numeric');
    expect(numeric.key).toEqual({ type: 'numeric', value: '2.80', unit: 'g/mL', tolerance: { kind: 'absolute', value: 0.01 }, sigFigs: 3 });
    const image = await page.request.get(`/api/media/images/${stored.items[0].imageId}`);
    expect(image.headers()['content-type']).toBe('image/png');

    await page.getByRole('navigation').getByRole('link', { name: 'Banks' }).click();
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name: title }) });
    await expect(row).toContainText('6');
    await expect(row).toContainText('Yours');
  });

  test('imports the sample bank CSV into a new bank and lists it', async ({ page }) => {
    const title = `E2E imported ${Date.now()}`;
    await signIn(page);
    await page.goto('/banks');
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Bank title (optional)').fill(title);
    await dialog.getByLabel('CSV file').setInputFiles(join(fixtures, 'sample-bank.csv'));
    await dialog.getByRole('button', { name: 'Import' }).click();
    await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
    await expect(page.getByRole('list', { name: 'Items' }).getByRole('listitem')).toHaveCount(6);

    await page.getByRole('navigation').getByRole('link', { name: 'Banks' }).click();
    await page.getByLabel('Search titles').fill(title);
    const rows = page.getByRole('table', { name: 'Banks' }).getByRole('row');
    await expect(rows).toHaveCount(2); // header + the imported bank
    await expect(rows.nth(1)).toContainText('6');
  });

  test('a bad bank CSV is refused with a row-and-column report', async ({ page }) => {
    await signIn(page);
    await page.goto('/banks');
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog');
    const csv = [
      'type,prompt,option_a,option_b,option_c,option_d,option_e,option_f,option_g,option_h,correct,order,numeric_value,numeric_unit,tolerance,tolerance_kind,sig_figs,accepted_answers,typo_tolerance,explanation,tags',
      'single,Pick one,Yes,No,,,,,,,C,,,,,,,,,,',
    ].join('\n');
    await dialog.getByLabel('CSV file').setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await dialog.getByRole('button', { name: 'Import' }).click();
    await expect(dialog.getByRole('list', { name: 'Problems in the file' })).toContainText('Row 2, column correct');
  });

  test('creates a class, imports the sample roster and sees it in the tables and the seat map', async ({ page }) => {
    const name = `E2E Chemistry ${Date.now()}`;
    await signIn(page);
    await page.getByRole('navigation').getByRole('link', { name: 'Classes' }).click();
    await page.getByLabel('Class name').fill(name);
    await page.getByLabel('Period').fill('3');
    await page.getByLabel('Term').fill('Autumn 2026');
    await page.getByRole('button', { name: 'Create class' }).click();
    await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
    await expect(page.getByRole('note')).toContainText('no surnames, IDs or e-mail addresses needed');

    await page.getByRole('button', { name: 'Import roster CSV' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('CSV file').setInputFiles(join(fixtures, 'sample-roster.csv'));
    await dialog.getByRole('button', { name: 'Import' }).click();
    await expect(dialog).toBeHidden();

    const roster = page.getByRole('table', { name: 'Roster' });
    await expect(roster.getByRole('rowheader')).toHaveCount(7);
    await expect(roster.getByRole('row').filter({ hasText: 'Zara K.' })).toContainText('×2 time');

    await page.getByRole('tab', { name: /seat map/i }).click();
    const map = page.getByRole('list', { name: 'Seat map' });
    await expect(map.getByRole('heading')).toHaveText(['Table 1', 'Table 2']);
    await expect(page.getByRole('list', { name: 'Seats at Table 1' }).getByRole('listitem')).toHaveCount(4);
    await expect(page.getByRole('list', { name: 'Seats at Table 2' }).getByRole('listitem').last()).toContainText('Diego M.');

    await page.getByRole('navigation').getByRole('link', { name: 'Classes' }).click();
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name }) });
    await expect(row).toContainText('7');
    await expect(row).toContainText('Autumn 2026');
  });
});
