import { expect, test } from '@playwright/test';
import { demoSchool, demoTeacher, demoTeacherSignOn, signOnWithoutAccount } from './fixtures';

// School sign-on against the local demo OpenID provider that playwright.config.ts starts.
test.describe('school sign-on', () => {
  test('the demo teacher signs in with the school account and lands on the dashboard', async ({ page, baseURL }) => {
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Sign in with school account' }).click();

    // The provider's own login page, on its own origin.
    await expect(page).toHaveURL(/\/interaction\//);
    expect(new URL(page.url()).origin).not.toBe(baseURL);
    await page.getByLabel('Login name').fill(demoTeacherSignOn.login);
    await page.getByLabel('Password').fill(demoTeacherSignOn.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await expect(page.getByRole('heading', { level: 1 })).toContainText(demoTeacher.displayName);
    await expect(page.getByText(demoSchool.name)).toBeVisible();
    expect(new URL(page.url()).pathname).toBe('/');
    // The same httpOnly cookie session as a password sign-in; the flow cookie is spent.
    const cookies = await page.context().cookies(baseURL);
    expect(cookies.find((c) => c.name === 'covalent_sid')?.httpOnly).toBe(true);
    expect(cookies.find((c) => c.name === 'covalent_sign_on')).toBeUndefined();
    const me = await page.request.get('/api/me');
    expect(await me.json()).toMatchObject({ email: demoTeacher.email, role: 'teacher' });
  });

  test("an unknown login is refused on the provider's page with its message", async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Sign in with school account' }).click();
    await page.getByLabel('Login name').fill('nobody-at-this-school');
    await page.getByLabel('Password').fill('not a password of anyone');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toHaveText('That login name and password do not match a school account.');
    await expect(page).toHaveURL(/\/interaction\//);
    expect((await page.request.get('/api/me')).status()).toBe(401);
  });

  test('a school account without a Covalent account comes back to the sign-in page with an explanation', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Sign in with school account' }).click();
    await page.getByLabel('Login name').fill(signOnWithoutAccount.login);
    await page.getByLabel('Password').fill(signOnWithoutAccount.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    await expect(page).toHaveURL(/\/sign-in\?error=no_account$/);
    await expect(page.getByRole('alert')).toHaveText(
      'No Covalent account uses that school e-mail. Ask your school admin for an invitation.',
    );
    // The password form is still there, and nobody is signed in.
    await expect(page.getByLabel(/e-mail/i)).toBeVisible();
    expect((await page.request.get('/api/me')).status()).toBe(401);
  });
});
