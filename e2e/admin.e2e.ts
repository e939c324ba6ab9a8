import { expect, test } from '@playwright/test';
import { demoAdmin, demoTeacher } from './fixtures';

async function signIn(page: import('@playwright/test').Page, user: { email: string; password: string; displayName: string }) {
  await page.goto('/sign-in');
  await page.getByLabel(/e-mail/i).fill(user.email);
  await page.getByLabel(/^password/i).fill(user.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(user.displayName);
}

test.describe("the school's player-data retention", () => {
  test('an administrator sets how many days player data is kept, and it holds after a reload', async ({ page }) => {
    await signIn(page, demoAdmin);
    await page.getByRole('navigation').getByRole('link', { name: 'Staff' }).click();
    await expect(page.getByRole('heading', { name: 'Player data' })).toBeVisible();
    const days = page.getByLabel('Days to keep player data');
    // Out of range (1–3650 days, the server's bounds) is refused on the page.
    await days.fill('0');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect(page.getByText('Enter a whole number of days from 1 to 3650.')).toBeVisible();
    await days.fill('200');
    await page.getByRole('button', { name: 'Save' }).click();
    await expect(page.getByRole('status').filter({ hasText: 'Saved: player data is kept for 200 days.' })).toBeVisible();
    await page.reload();
    await expect(page.getByLabel('Days to keep player data')).toHaveValue('200');
    expect((await (await page.request.get('/api/admin/school')).json()).retentionDays).toBe(200);
  });

  test('a teacher has no staff page and the school settings answer 403', async ({ page }) => {
    await signIn(page, demoTeacher);
    await expect(page.getByRole('navigation').getByRole('link', { name: 'Staff' })).toHaveCount(0);
    const res = await page.request.patch('/api/admin/school', { data: { retentionDays: 1 } });
    expect(res.status()).toBe(403);
    expect((await res.json()).ok).toBe(false);
  });
});
