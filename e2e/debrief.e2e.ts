import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { io, type Socket } from 'socket.io-client';
import { demoTeacher } from './fixtures';

/*
 * After the bell: a short solo session is played over real sockets from the test process (the
 * live screens have their own suite), then the teacher works through the debrief in the browser.
 * Speed is off (speed weight 0), so points are 1000 · credit (DESIGN.md §4).
 */

const MAIL_HTTP_PORT = Number(process.env.E2E_MAIL_HTTP_PORT ?? 8126);

interface BankItem {
  id: string;
  type: string;
  options: { id: string; text: string }[];
  key: { type: string; correctOptionId?: string; value?: boolean };
}

async function signIn(page: Page): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel(/e-mail/i).fill(demoTeacher.email);
  await page.getByLabel(/^password/i).fill(demoTeacher.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
}

function connect(baseURL: string, path: string, auth: object, cookie?: string): Promise<Socket> {
  return new Promise((resolve, reject) => {
    const s = io(baseURL + path, { transports: ['websocket'], auth, extraHeaders: cookie ? { cookie } : undefined, forceNew: true });
    s.once('connect', () => resolve(s));
    s.once('connect_error', reject);
  });
}

/** Plays three single/true-false items with four players: player i answers item r right when (i + r) is even. */
async function playSession(
  request: APIRequestContext,
  baseURL: string,
  cookie: string,
): Promise<{ sessionId: string; classId: string; title: string; students: string[] }> {
  const banks = (await (await request.get('/api/banks')).json()) as { id: string; title: string }[];
  const bank = banks.find((b) => /safety equipment/i.test(b.title))!;
  const items = ((await (await request.get(`/api/banks/${bank.id}/items`)).json()) as BankItem[])
    .filter((i) => i.type === 'single' || i.type === 'truefalse')
    .slice(0, 3);
  expect(items).toHaveLength(3);
  const classes = (await (await request.get('/api/classes')).json()) as { id: string; name: string; period: string | null }[];
  const period2 = classes.find((c) => c.name === 'Chemistry' && c.period === '2')!;
  const created = await request.post('/api/sessions', {
    data: {
      bankId: bank.id, itemIds: items.map((i) => i.id), classId: period2.id, format: 'solo', roundSeconds: 60, speedWeight: 0,
      standings: 'full', targetTeamSize: 2, mixerMode: 'random', namePack: 'elements',
    },
  });
  expect(created.status()).toBe(201);
  const session = (await created.json()) as { id: string; joinCode: string };
  const host = await connect(baseURL, '/host', { sessionId: session.id, protocolVersion: 1 }, cookie);
  const command = async (type: string, allow: string[] = []) => {
    const ack = await host.timeout(10_000).emitWithAck('host:command', { type });
    if (!ack.ok && !allow.includes(ack.error)) throw new Error(`${type}: ${ack.error} ${ack.message}`);
  };
  // Students pick themselves from the class list, so the catch-up can find them again.
  const info = (await (await request.get(`/api/play/sessions/${session.joinCode}`)).json()) as { roster: { id: string; displayName: string }[] };
  const picked = info.roster.slice(0, 4);
  const players: Socket[] = [];
  for (const entry of picked) {
    const join = await request.post('/api/play/join', { data: { code: session.joinCode, rosterEntryId: entry.id } });
    expect(join.ok()).toBe(true);
    const { playerToken } = (await join.json()) as { playerToken: string };
    players.push(await connect(baseURL, '/play', { token: playerToken, protocolVersion: 1 }));
  }
  await command('start');
  for (let r = 0; r < items.length; r++) {
    if (r > 0) await command('next');
    await command('open_round');
    const item = items[r];
    for (let i = 0; i < players.length; i++) {
      const right = (i + r) % 2 === 0;
      const response =
        item.type === 'truefalse'
          ? { type: 'truefalse', value: right ? item.key.value : !item.key.value }
          : { type: 'single', optionId: right ? item.key.correctOptionId : item.options.find((o) => o.id !== item.key.correctOptionId)!.id };
      const ack = await players[i].timeout(10_000).emitWithAck('answer:submit', { clientMessageId: `e2e-${r}-${i}`, roundIndex: r, response });
      expect(ack.ok).toBe(true);
    }
    await command('close_round', ['round_not_open']); // closes by itself once everyone answered
    await command('reveal');
  }
  await command('end');
  for (const s of [host, ...players]) s.close();
  return { sessionId: session.id, classId: period2.id, title: bank.title, students: picked.map((e) => e.displayName) };
}

test('the teacher reads, sorts, exports and sends the debrief of a played session', async ({ page, baseURL }) => {
  await signIn(page);
  const cookie = (await page.context().cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
  const { sessionId, classId, title, students } = await playSession(page.request, baseURL!, cookie);

  await page.getByRole('navigation').getByRole('link', { name: 'Debriefs' }).click();
  await page.locator(`a[href$="/debriefs/${sessionId}"]`).first().click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(title);

  // Half the answers were right on every item: p = 2/4 = 0.5 each (mean credit, DESIGN.md §6).
  const items = page.getByRole('table', { name: 'Item analysis' });
  await expect(items.getByRole('row')).toHaveCount(4); // header + 3 items
  const pHeader = items.getByRole('columnheader', { name: /^p/ });
  await pHeader.getByRole('button').click();
  await expect(pHeader).toHaveAttribute('aria-sort', /descending|ascending/);
  await expect(items.getByText('0.50').first()).toBeVisible();

  const studentTable = page.getByRole('table', { name: 'Students' });
  await expect(studentTable.getByRole('row')).toHaveCount(5); // header + 4 students
  const firstStudent = studentTable.getByRole('row').filter({ hasText: students[0] });
  await expect(firstStudent).toContainText('66.7%'); // right on items 1 and 3 of 3
  // Missed items are one line each until the teacher asks for the answers beside the keys.
  await expect(firstStudent).toContainText('Item 2');
  await expect(firstStudent).not.toContainText('Key:');
  const answersSwitch = page.getByRole('switch', { name: 'Show each answer beside the key' });
  await answersSwitch.click();
  await expect(firstStudent).toContainText('Key:');

  // Both CSVs download with their headers.
  for (const [name, header] of [
    [/gradebook/i, /student/i],
    [/item analysis/i, /item/i],
  ] as const) {
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name }).click();
    const file = await (await download).path();
    const text = readFileSync(file!, 'utf8').replace(/^\uFEFF/, '');
    expect(text.split(/\r?\n/)[0]).toMatch(header);
    expect(text.trim().split(/\r?\n/).length).toBeGreaterThanOrEqual(4);
  }

  // The e-mail reaches the local SMTP catcher with the gradebook attached.
  await page.getByRole('button', { name: /send to me and co-teachers/i }).click();
  await expect(page.getByText(/debrief sent/i)).toBeVisible();
  await expect
    .poll(async () => {
      const messages = (await (await fetch(`http://127.0.0.1:${MAIL_HTTP_PORT}/messages`)).json()) as {
        to: string[];
        attachments: { filename: string }[];
      }[];
      return messages.some((m) => m.to.includes(demoTeacher.email) && m.attachments.some((a) => a.filename.endsWith('.csv')));
    })
    .toBe(true);

  // The printable view in Chromium's own print rendering: the figures, without navigation or buttons.
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('navigation')).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(page.getByRole('button', { name: 'Create catch-up' })).toBeHidden();
  await expect(answersSwitch).toBeHidden();
  await expect(firstStudent).toContainText('Key:'); // printed as the switch left it
  await expect(items).toBeVisible();
  await expect(studentTable).toBeVisible();
  const pdf = await page.pdf({ format: 'A4' });
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-'); // ISO 32000-1 §7.5.2: a PDF file starts with its header "%PDF-"
  await page.emulateMedia({ media: 'screen' });
  await expect(page.getByRole('button', { name: 'Print' })).toBeVisible();

  // The first student missed item 2 of 3 (right when (0 + r) is even): a catch-up of that one.
  await page.getByRole('button', { name: 'Create catch-up' }).click();
  const code = (await page.getByTestId('catchup-code').textContent())!.trim();
  const phone = await page.context().browser()!.newContext({ viewport: { width: 360, height: 740 } });
  const student = await phone.newPage();
  await student.goto(`/play/catchup/${code}`);
  await student.getByLabel(students[0]).check();
  await student.getByRole('button', { name: 'Start' }).click();
  let answered = 0;
  while (!(await student.getByRole('heading', { name: /all done for today/i }).isVisible())) {
    await student.getByRole('list', { name: 'Options' }).getByRole('button').first().click();
    await student.getByRole('button', { name: 'Check answer' }).click();
    await expect(student.getByRole('heading', { name: 'Why' }).or(student.getByRole('heading', { name: 'The right answer' })).first()).toBeVisible();
    answered += 1;
    await student.getByRole('button', { name: /next item|see how you did/i }).click();
    expect(answered).toBeLessThanOrEqual(3);
  }
  expect(answered).toBe(1);
  await expect(student.getByText(/of 1 right/)).toBeVisible();

  // Cards made: each student missed the items where (i + r) is odd — 1, 2, 1 and 2 of them.
  await page.reload();
  const catchups = page.getByRole('table', { name: 'Catch-ups of this session' });
  const catchupRow = catchups.getByRole('row').filter({ hasText: code });
  await expect(catchupRow).toContainText('open');
  await expect(catchupRow).toContainText('1 of 4'); // students started
  await expect(catchupRow).toContainText(/of 6/); // cards cleared of all cards
  await page.getByRole('button', { name: `Results for catch-up ${code}` }).click();
  const results = page.getByRole('table', { name: `Catch-up results ${code}` });
  const lastResult = /^(right|wrong)$/;
  await expect(results.getByRole('row').filter({ hasText: students[0] }).getByRole('cell', { name: lastResult })).toHaveCount(1);
  await expect(results.getByRole('row').filter({ hasText: students[1] }).first().getByRole('cell', { name: 'not yet' })).toBeVisible();

  // The catch-up answer reaches the student's history, opened from the class list.
  await page.goto(`/classes/${classId}`);
  await page.getByRole('link', { name: `History for ${students[0]}` }).click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(students[0]);
  const sessionsTable = page.getByRole('table', { name: 'Sessions' });
  await expect(sessionsTable.getByRole('row').filter({ hasText: title })).toContainText('66.7%'); // right on 2 of 3 items
  const historyCard = page.getByRole('article').filter({ hasText: title });
  await expect(historyCard.getByRole('table').getByRole('cell', { name: lastResult })).toHaveCount(1);
  // …and the class page, where every student has a line.
  await page.getByRole('link', { name: 'Class trends' }).click();
  const classStudents = page.getByRole('table', { name: 'Students of the class' });
  await expect(classStudents.getByRole('link', { name: students[0] })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Catch-ups of the class' }).getByRole('row').filter({ hasText: title })).toContainText('1 of 4');

  // Closing the catch-up stops its code; the results stay.
  await page.getByRole('table', { name: 'Catch-ups of the class' }).getByRole('link', { name: title }).first().click();
  await page.getByRole('button', { name: `Close catch-up ${code}` }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: 'Close catch-up' }).click();
  await expect(catchupRow).toContainText('closed');
  await expect(page.getByRole('button', { name: `Close catch-up ${code}` })).toHaveCount(0);
  await student.goto(`/play/catchup/${code}`);
  await expect(student.getByRole('alert')).toContainText(/no catch-up has that code/i);
  await phone.close();

  // An item page shows its distractor table.
  await items.getByRole('link').first().click();
  await expect(page.getByRole('table', { name: 'Distractor analysis' })).toBeVisible();

  // On request the class's owner deletes one student's data: their history empties and the
  // debrief counts them as removed, in no figure (DESIGN.md §9: deletion is real).
  await page.goto(`/classes/${classId}`);
  await page.getByRole('link', { name: `History for ${students[1]}` }).click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(students[1]);
  await page.getByRole('button', { name: "Delete this student's data" }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: 'Delete data' }).click();
  await expect(page.getByRole('status').filter({ hasText: /3 responses/ })).toBeVisible(); // one answer per item, 3 items
  await expect(page.getByText('No ended sessions for this student in this class yet.')).toBeVisible();
  await expect(page.getByRole('table', { name: 'Sessions' })).toHaveCount(0);
  await page.goto(`/debriefs/${sessionId}`);
  await expect(page.getByText(/1 removed, in no figure/)).toBeVisible();
  await expect(studentTable.getByRole('row').filter({ hasText: students[1] })).toHaveCount(0);
});
