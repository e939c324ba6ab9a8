import { expect, test, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { mkdirSync } from 'node:fs';
import { Client } from 'pg';
import { demoTeacher } from './fixtures';

/*
 * A whole live session in the browser: the teacher's host screen in one context, six phones in
 * six others. Speed is switched off (speed weight 0) so every number below can be worked out by
 * hand from DESIGN.md §4: points = round(1000 · credit · (1 − 0 · t/T)) = 1000 · credit;
 * huddle team points = mean of the members' points, × 1.1 when every member chose correctly;
 * numbered team points = the called member's points.
 */

const SHOTS = '/tmp/live-shots';
const PHONE = { width: 360, height: 740 };
const NICKNAMES = ['Ada', 'Bram', 'Cleo', 'Dev', 'Esi', 'Femi'];

interface BankItem {
  id: string;
  prompt: string;
  type: string;
  options: { id: string; text: string }[];
  key: { type: 'single'; correctOptionId: string } | { type: 'truefalse'; value: boolean } | { type: string };
}

interface Phone {
  nickname: string;
  context: BrowserContext;
  page: Page;
}

interface Team {
  name: string;
  members: Phone[];
}

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel(/e-mail/i).fill(demoTeacher.email);
  await page.getByLabel(/^password/i).fill(demoTeacher.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
}

/** The seeded safety bank and its items, keys included (the teacher's own API). */
async function safetyBank(page: Page): Promise<{ id: string; items: BankItem[] }> {
  const banks = (await (await page.request.get('/api/banks')).json()) as { id: string; title: string }[];
  const bank = banks.find((b) => /safety equipment/i.test(b.title));
  expect(bank, 'the demo seed has the safety-equipment bank').toBeTruthy();
  const items = (await (await page.request.get(`/api/banks/${bank!.id}/items`)).json()) as BankItem[];
  return { id: bank!.id, items };
}

/** The text of an item's correct option ("True"/"False" for true/false items). */
function correctText(item: BankItem): string {
  if (item.key.type === 'truefalse') return (item.key as { value: boolean }).value ? 'True' : 'False';
  const id = (item.key as { correctOptionId: string }).correctOptionId;
  return item.options.find((o) => o.id === id)!.text;
}

/** The text of the n-th wrong option. */
function wrongText(item: BankItem, n = 0): string {
  if (item.key.type === 'truefalse') return (item.key as { value: boolean }).value ? 'False' : 'True';
  const id = (item.key as { correctOptionId: string }).correctOptionId;
  return item.options.filter((o) => o.id !== id)[n]!.text;
}

/** Fills the setup form: the chosen items only, speed off, two teams; returns the session id. */
async function setUpSession(page: Page, bankId: string, all: BankItem[], chosen: BankItem[], format: 'huddle' | 'numbered') {
  await page.goto('/sessions/new');
  await page.getByLabel('Bank', { exact: true }).selectOption(bankId);
  await page.getByRole('checkbox', { name: 'Choose and order the items myself' }).click();
  const list = page.getByRole('list', { name: 'Items to play' });
  for (const [index, item] of all.entries()) {
    if (chosen.includes(item)) continue;
    await list.getByRole('checkbox', { name: `${index + 1}. ${item.prompt}` }).click();
  }
  await page.getByRole('radio', { name: new RegExp(`^${format} —`) }).click();
  await page.getByLabel(/^Speed weight/).fill('0');
  await expect(page.getByText('Speed weight: 0.00')).toBeVisible();
  await page.getByRole('radio', { name: 'Number of teams' }).click();
  await page.getByLabel('Teams', { exact: true }).fill('2');
  await page.getByRole('button', { name: 'Create session and open host screen' }).click();
  await expect(page).toHaveURL(/\/host\/[0-9a-f-]{36}$/);
  return page.url().split('/').pop()!;
}

async function joinCodeOf(host: Page): Promise<string> {
  const code = (await host.locator('.host-join-code').textContent())?.trim() ?? '';
  expect(code).toMatch(/^[A-HJ-KM-NP-Z2-9]{6}$/);
  return code;
}

async function openPhones(browser: Browser, code: string): Promise<Phone[]> {
  return Promise.all(
    NICKNAMES.map(async (nickname) => {
      const context = await browser.newContext({ viewport: PHONE });
      const page = await context.newPage();
      await page.goto('/play/');
      await page.getByLabel('Join code').fill(code);
      await page.getByLabel('Nickname').fill(nickname);
      await page.getByRole('button', { name: 'Join' }).click();
      await expect(page.getByRole('heading', { name: "You're in. Waiting for your teacher to start." })).toBeVisible();
      return { nickname, context, page };
    }),
  );
}

/** Forms teams in the lobby and reads them off the host screen: each team's name and members. */
async function formTeams(host: Page, phones: Phone[]): Promise<Team[]> {
  await expect(host.getByRole('heading', { name: '6 players in 0 teams' })).toBeVisible();
  await host.getByRole('button', { name: 'Reshuffle' }).click();
  await expect(host.getByRole('heading', { name: '6 players in 2 teams' })).toBeVisible();
  const regions = host.getByRole('region', { name: /^Team / });
  await expect(regions).toHaveCount(2);
  const teams: Team[] = [];
  for (let i = 0; i < 2; i++) {
    const region = regions.nth(i);
    const name = (await region.getAttribute('aria-label'))!.replace(/^Team /, '');
    await expect(region.getByRole('heading')).toContainText(name);
    const names = (await region.locator('.host-member-name').allTextContents()).map((t) => t.replace(/^\d+\.\s*/, '').trim());
    teams.push({ name, members: names.map((n) => phones.find((p) => p.nickname === n)!) });
  }
  // The Mixer keeps sizes within one of each other: 6 players in 2 teams is 3 and 3.
  expect(teams.map((t) => t.members.length)).toEqual([3, 3]);
  for (const team of teams) {
    for (const member of team.members) await expect(member.page.locator('.team-card-title')).toContainText(team.name);
  }
  return teams;
}

async function expectRoundOpen(phones: Phone[], item: BankItem) {
  for (const phone of phones) await expect(phone.page.getByRole('heading', { level: 1, name: item.prompt })).toBeVisible();
}

/** A huddle vote: tap the option and wait until the phone shows it as this player's vote. */
async function vote(phone: Phone, optionText: string) {
  const option = phone.page.getByRole('button', { name: optionText, exact: false });
  await option.click();
  await expect(option).toHaveAttribute('aria-pressed', 'true');
  await expect(phone.page.locator('.option-row', { has: option }).locator('.vote-names')).toContainText('You');
}

/** Locks the vote in; the last member to lock in closes the round, so their phone moves on at once. */
async function lockIn(phone: Phone, last = false) {
  await phone.page.getByRole('button', { name: 'Lock in' }).click();
  if (last) await expect(phone.page.getByRole('heading', { level: 1, name: 'Round closed' })).toBeVisible();
  else await expect(phone.page.getByText(/^Locked in: .*Wait for the reveal\.$/)).toBeVisible();
}

async function lockAll(phones: Phone[]) {
  for (const [i, p] of phones.entries()) await lockIn(p, i === phones.length - 1);
}

async function reveal(host: Page) {
  await host.getByRole('button', { name: 'Reveal' }).click();
  await expect(host.getByRole('heading', { name: /^Answer: / })).toBeVisible();
}

/** The host's standings, top to bottom, as "name points". */
async function standings(host: Page): Promise<string[]> {
  const rows = host.locator('.host-standing');
  return (await rows.allTextContents()).map((t) => t.replace(/\s+/g, ' ').trim());
}

async function expectStandings(host: Page, expected: [string, number][]) {
  await expect(host.locator('.host-standing')).toHaveCount(expected.length);
  await expect
    .poll(() => standings(host))
    .toEqual(expected.map(([name, points], i) => `${i + 1}${name}${points.toLocaleString('en')} pts`));
}

async function withDb<T>(run: (db: Client) => Promise<T>): Promise<T> {
  const db = new Client({ connectionString: process.env.DATABASE_URL });
  await db.connect();
  try {
    return await run(db);
  } finally {
    await db.end();
  }
}

interface ResponseRow {
  nickname: string;
  round_index: number;
  kind: string;
  final: boolean;
  points: number | null;
  correct: boolean | null;
}

async function responseRows(sessionId: string): Promise<ResponseRow[]> {
  return withDb(async (db) => {
    const result = await db.query<ResponseRow>(
      `SELECT p.nickname, r.round_index, r.kind, r.final, r.points, r.correct
         FROM responses r JOIN session_players p ON p.id = r.player_id
        WHERE r.session_id = $1 ORDER BY r.seq`,
      [sessionId],
    );
    return result.rows;
  });
}

async function playerStatus(sessionId: string, nickname: string): Promise<string> {
  return withDb(async (db) => {
    const result = await db.query<{ status: string }>('SELECT status FROM session_players WHERE session_id = $1 AND nickname = $2', [sessionId, nickname]);
    return result.rows[0]?.status ?? 'missing';
  });
}

test.describe('a live session, host screen and six phones', () => {
  test.beforeAll(() => mkdirSync(SHOTS, { recursive: true }));

  test('huddle: three rounds with votes, lock-ins, a dropped phone, standings and the end screen', async ({ browser }) => {
    test.setTimeout(90_000);
    const hostContext = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
    const host = await hostContext.newPage();
    await signIn(host);
    const bank = await safetyBank(host);
    const choice = bank.items.filter((i) => i.type === 'single' || i.type === 'truefalse');
    // Two single-answer items and a true/false item.
    const items = [choice[0]!, choice[1]!, bank.items.find((i) => i.type === 'truefalse')!];
    expect(items.map((i) => i.type)).toEqual(['single', 'single', 'truefalse']);
    const sessionId = await setUpSession(host, bank.id, bank.items, items, 'huddle');
    const code = await joinCodeOf(host);

    const phones = await openPhones(browser, code);
    try {
      const [t1, t2] = await formTeams(host, phones);
      const [a1, a2, a3] = t1!.members as [Phone, Phone, Phone];
      const [b1, b2, b3] = t2!.members as [Phone, Phone, Phone];
      await host.screenshot({ path: `${SHOTS}/host-lobby.png` });
      await host.getByRole('button', { name: 'Start' }).click();

      // ---- round 1: team 1 all right, team 2 two right and one wrong
      await host.getByRole('button', { name: 'Open round' }).click();
      await expect(host.getByRole('heading', { name: items[0]!.prompt })).toBeVisible();
      await expectRoundOpen(phones, items[0]!);
      for (const p of [a1, a2, a3, b1, b2]) await vote(p, correctText(items[0]!));
      await vote(b3, wrongText(items[0]!));
      // Teammates see each other's votes live, and never the other team's.
      await expect(a1.page.locator('.vote-names')).toHaveText([`You, ${a2.nickname}, ${a3.nickname}`]);
      await expect(b3.page.locator('.vote-names')).toHaveCount(2);
      await expect(host.getByText('0 of 3 answered')).toHaveCount(2);
      await b3.page.screenshot({ path: `${SHOTS}/phone-answering.png` });
      await host.screenshot({ path: `${SHOTS}/host-round.png` });
      for (const p of [a1, a2, a3, b1, b2]) await lockIn(p);
      await expect(host.getByText('3 of 3 answered')).toBeVisible();
      await lockIn(b3, true);
      // Everyone locked in: the round closes by itself.
      await expect(host.getByRole('button', { name: 'Reveal' })).toBeVisible();
      await reveal(host);
      // Team 1: mean(1000, 1000, 1000) × 1.1 = 1100. Team 2: mean(1000, 1000, 0) = 666.67 → 667.
      await expectStandings(host, [[t1!.name, 1100], [t2!.name, 667]]);
      await expect(a1.page.getByRole('heading', { name: 'Correct' })).toBeVisible();
      await expect(a1.page.getByText('Everyone on your team chose the right answer: unity bonus.')).toBeVisible();
      await expect(a1.page.locator('.result-points')).toContainText('Team points this round1,100');
      await expect(b3.page.getByRole('heading', { name: 'Incorrect' })).toBeVisible();
      await expect(b3.page.locator('.result-points')).toContainText('Your points0');
      await expect(b3.page.locator('.result-points')).toContainText('Team points this round667');
      await expect(b3.page.getByRole('region', { name: "Your team's standing" })).toContainText(`Team ${t2!.name} is 2nd of 2`);
      await b3.page.screenshot({ path: `${SHOTS}/phone-result.png` });
      await host.screenshot({ path: `${SHOTS}/host-reveal.png` });

      // ---- round 2: team 1 one right, team 2 none right
      await host.getByRole('button', { name: 'Next' }).click();
      await host.getByRole('button', { name: 'Open round' }).click();
      await expectRoundOpen(phones, items[1]!);
      await vote(a1, correctText(items[1]!));
      for (const p of [a2, a3, b1]) await vote(p, wrongText(items[1]!, 0));
      await vote(b2, wrongText(items[1]!, 1));
      await vote(b3, wrongText(items[1]!, 2));
      await lockAll(phones);
      await reveal(host);
      // Team 1: mean(1000, 0, 0) = 333.33 → 333, total 1433. Team 2: 0, total 667.
      await expectStandings(host, [[t1!.name, 1433], [t2!.name, 667]]);
      await expect(a2.page.getByRole('heading', { name: 'Incorrect' })).toBeVisible();

      // ---- round 3: a dropped phone; then everyone right
      await host.getByRole('button', { name: 'Next' }).click();
      await host.getByRole('button', { name: 'Open round' }).click();
      await expectRoundOpen(phones, items[2]!);
      await b2.page.close();
      // After the grace period the server marks the player away (stored with the session).
      await expect.poll(() => playerStatus(sessionId, b2.nickname), { timeout: 15_000 }).toBe('away');
      // Same context, new page: the stored token brings the player straight back to the open round.
      b2.page = await b2.context.newPage();
      await b2.page.goto('/play/');
      await expect(b2.page.getByRole('heading', { level: 1, name: items[2]!.prompt })).toBeVisible();
      await expect(b2.page.locator('.team-badge')).toHaveText(`Team ${t2!.name}`);
      await expect.poll(() => playerStatus(sessionId, b2.nickname)).toBe('connected');
      for (const p of phones) await vote(p, correctText(items[2]!));
      await lockAll(phones);
      await reveal(host);
      // Both teams unanimous and right: 1000 × 1.1 = 1100 each. Totals 2533 and 1767.
      await expectStandings(host, [[t1!.name, 2533], [t2!.name, 1767]]);
      await expect(b2.page.getByRole('heading', { name: 'Correct' })).toBeVisible();
      await expect(b2.page.getByRole('region', { name: "Your team's standing" })).toContainText('1,767 points so far');

      // ---- the end
      await host.getByRole('button', { name: 'Show summary' }).click();
      // Class accuracy = mean credit over the 18 votes: (5 + 1 + 6) / 18 = 66.7% → 67%.
      await expect(host.getByRole('region', { name: 'Class accuracy' })).toContainText('67%');
      // Items under 0.7 mean credit: only item 2, at 1/6 = 16.7% → 17%.
      const revisit = host.getByRole('region', { name: 'Items to revisit' }).getByRole('listitem');
      await expect(revisit).toHaveCount(1);
      await expect(revisit.first()).toContainText(items[1]!.prompt);
      await expect(revisit.first()).toContainText('(17% correct)');
      await expectStandings(host, [[t1!.name, 2533], [t2!.name, 1767]]);
      await host.screenshot({ path: `${SHOTS}/host-end.png` });
      // The dropped player kept their points: 1000 + 0 + 1000 = 2000 of their own.
      for (const p of phones) await expect(p.page.getByRole('heading', { name: "That's the end of the review" })).toBeVisible();
      const b2End = b2.page.locator('.result-points');
      await expect(b2End).toContainText('Answered3 of 3');
      await expect(b2End).toContainText('Correct2');
      await expect(b2End).toContainText('Your points2,000');
      await expect(a1.page.locator('.result-points')).toContainText('Your points3,000');
      await expect(b2.page.getByRole('region', { name: "Your team's standing" })).toContainText(`Team ${t2!.name} is 2nd of 2`);
      await b2.page.screenshot({ path: `${SHOTS}/phone-end.png` });

      // ---- the database: one row per accepted vote and one per lock-in, nothing more
      const rows = await responseRows(sessionId);
      // 6 players × 3 rounds, each one tap (a vote) and one lock-in.
      expect(rows.filter((r) => r.kind === 'answer')).toHaveLength(18);
      expect(rows.filter((r) => r.kind === 'lock')).toHaveLength(18);
      expect(rows).toHaveLength(36);
      const finals = rows.filter((r) => r.final);
      expect(finals).toHaveLength(18);
      const pointsOf = (nickname: string) => finals.filter((r) => r.nickname === nickname).sort((x, y) => x.round_index - y.round_index).map((r) => r.points);
      expect(pointsOf(a1.nickname)).toEqual([1000, 1000, 1000]);
      expect(pointsOf(a2.nickname)).toEqual([1000, 0, 1000]);
      expect(pointsOf(b2.nickname)).toEqual([1000, 0, 1000]);
      expect(pointsOf(b3.nickname)).toEqual([0, 0, 1000]);
      expect(finals.filter((r) => r.correct).length).toBe(12);
    } finally {
      await Promise.all(phones.map((p) => p.context.close()));
      await hostContext.close();
    }
  });

  test('numbered: two rounds where only the called member answers', async ({ browser }) => {
    test.setTimeout(60_000);
    const hostContext = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
    const host = await hostContext.newPage();
    await signIn(host);
    const bank = await safetyBank(host);
    // A true/false item and a single-answer item, later in the bank than the huddle's.
    const truefalse = bank.items.filter((i) => i.type === 'truefalse')[1]!;
    const single = bank.items.filter((i) => i.type === 'single')[2]!;
    const items = [truefalse, single].sort((x, y) => bank.items.indexOf(x) - bank.items.indexOf(y));
    const sessionId = await setUpSession(host, bank.id, bank.items, items, 'numbered');
    const code = await joinCodeOf(host);

    const phones = await openPhones(browser, code);
    try {
      const teams = await formTeams(host, phones);
      // Members are numbered 1–3 within each team.
      for (const region of await host.getByRole('region', { name: /^Team / }).all()) {
        await expect(region.locator('.host-member-name')).toHaveText([/^1\. /, /^2\. /, /^3\. /]);
      }
      await host.getByRole('button', { name: 'Start' }).click();

      /** Opens a round and finds each team's called member: the only phone with the answer buttons. */
      async function openAndFindCalled(item: BankItem): Promise<Phone[]> {
        await host.getByRole('button', { name: 'Open round' }).click();
        await expectRoundOpen(phones, item);
        const called: Phone[] = [];
        for (const team of teams) {
          const withOptions: Phone[] = [];
          for (const m of team.members) {
            const discuss = m.page.getByRole('status').filter({ hasText: 'Discuss with your team' });
            // Exact: teammates see the options too, as a list "Options to talk over" with nothing to press.
            const options = m.page.getByRole('list', { name: 'Options', exact: true });
            await expect(discuss.or(options)).toBeVisible();
            if (await options.isVisible()) withOptions.push(m);
          }
          expect(withOptions, `one called member on team ${team.name}`).toHaveLength(1);
          const caller = withOptions[0]!;
          for (const m of team.members) {
            if (m !== caller) await expect(m.page.getByText(`Discuss with your team — ${caller.nickname} answers this one.`)).toBeVisible();
          }
          called.push(caller);
        }
        return called;
      }

      /** The last team to answer closes the round, so that phone moves on at once. */
      async function answer(phone: Phone, text: string, last = false) {
        await phone.page.getByRole('button', { name: text }).click();
        if (last) await expect(phone.page.getByRole('heading', { level: 1, name: 'Round closed' })).toBeVisible();
        else await expect(phone.page.getByText(/^Answer sent: .*Wait for the reveal\.$/)).toBeVisible();
      }

      // ---- round 1: team 1's caller right (1000), team 2's caller wrong (0)
      const [c1, c2] = await openAndFindCalled(items[0]!);
      await answer(c1!, correctText(items[0]!));
      // Only the called member answers, so the host shows answered or not, never "1 of 3".
      const progress = host.getByRole('list', { name: 'Answers so far' }).getByRole('listitem');
      await expect(progress.filter({ hasText: teams[0]!.name })).toHaveText(/Answered$/);
      await expect(progress.filter({ hasText: teams[1]!.name })).toHaveText(/Not yet answered$/);
      await host.screenshot({ path: `${SHOTS}/host-numbered-round.png` });
      await teams[1]!.members.find((m) => m !== c2)!.page.screenshot({ path: `${SHOTS}/phone-numbered-discuss.png` });
      await answer(c2!, wrongText(items[0]!), true);
      await reveal(host);
      await expectStandings(host, [[teams[0]!.name, 1000], [teams[1]!.name, 0]]);
      const teammate = teams[1]!.members.find((m) => m !== c2)!;
      await expect(teammate.page.getByRole('heading', { name: "Your team's answer was not right" })).toBeVisible();

      // ---- round 2: both callers right: 1000 each, totals 2000 and 1000
      await host.getByRole('button', { name: 'Next' }).click();
      const [d1, d2] = await openAndFindCalled(items[1]!);
      await answer(d1!, correctText(items[1]!));
      await answer(d2!, correctText(items[1]!), true);
      await reveal(host);
      await expectStandings(host, [[teams[0]!.name, 2000], [teams[1]!.name, 1000]]);

      await host.getByRole('button', { name: 'Show summary' }).click();
      // Over team submissions: 3 right of 4 = 75%; item 1 at 1/2 = 50% is the one to revisit.
      await expect(host.getByRole('region', { name: 'Class accuracy' })).toContainText('75%');
      const revisit = host.getByRole('region', { name: 'Items to revisit' }).getByRole('listitem');
      await expect(revisit).toHaveCount(1);
      await expect(revisit.first()).toContainText(items[0]!.prompt);
      await expect(revisit.first()).toContainText('(50% correct)');

      // One row per submission: two teams × two rounds, all final, nothing from the others.
      const rows = await responseRows(sessionId);
      expect(rows).toHaveLength(4);
      expect(rows.every((r) => r.kind === 'answer' && r.final)).toBe(true);
      expect(rows.map((r) => [r.round_index, r.nickname, r.points])).toEqual(
        expect.arrayContaining([
          [0, c1!.nickname, 1000],
          [0, c2!.nickname, 0],
          [1, d1!.nickname, 1000],
          [1, d2!.nickname, 1000],
        ]),
      );
    } finally {
      await Promise.all(phones.map((p) => p.context.close()));
      await hostContext.close();
    }
  });
});
