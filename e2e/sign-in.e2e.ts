import { expect, test } from '@playwright/test';
import { demoSchool, demoTeacher } from './fixtures';

test.describe('teacher sign-in', () => {
  test('the seeded teacher signs in through the page and sees the dashboard', async ({ page }) => {
    await page.goto('/');
    await expect(page).toHaveURL(/sign-in/);
    await page.getByLabel(/e-mail/i).fill(demoTeacher.email);
    await page.getByLabel(/^password/i).fill(demoTeacher.password);
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
    await expect(page.getByText(demoSchool.name)).toBeVisible();
    for (const section of ['Classes', 'Banks', 'Sessions', 'Debriefs']) {
      await expect(page.getByRole('navigation').getByRole('link', { name: section })).toBeVisible();
    }
    // The session survives a reload: it lives in an httpOnly cookie, not in page state.
    await page.reload();
    await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
    const cookies = await page.context().cookies();
    expect(cookies.find((c) => c.name === 'covalent_sid')?.httpOnly).toBe(true);
  });

  test('a wrong password shows an error on the page and stays signed out', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel(/e-mail/i).fill(demoTeacher.email);
    await page.getByLabel(/^password/i).fill('definitely-not-the-password');
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect(page.getByRole('alert')).toContainText(/do not match/i);
    await expect(page).toHaveURL(/sign-in/);
    const me = await page.request.get('/api/me');
    expect(me.status()).toBe(401);
  });
});
