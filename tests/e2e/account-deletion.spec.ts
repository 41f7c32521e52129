import { expect, test, type Page } from '@playwright/test';
import { seriousViolations } from './helpers/axe';
import { lindenStreetDocument } from '../../lib/demo/systems';

/**
 * Deleting an account (issue 19), in Chromium: a fresh account with a saved System sees on Team that it cannot leave a
 * workspace it alone owns, opens "Delete your account" on /account (readable at 390 px, axe clean), sees what its
 * personal workspace holds, is refused a wrong password next to the field, deletes the account, lands on the home page
 * signed out with a message, and cannot sign in again.
 */
test.describe.configure({ timeout: 180_000 });

const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const EMAIL = `e2e-leaver-${unique}@example.test`;
const PASSWORD = 'a-long-enough-password';
// This walk's own client address: its deliberate failed passwords count against nobody else's sign-ins.
test.use({ extraHTTPHeaders: { 'X-Forwarded-For': `10.29.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}` } });

async function signIn(page: Page) {
  await expect(async () => {
    await page.goto('/sign-in');
    await page.waitForLoadState('networkidle');
    await page.getByLabel('E-mail').fill(EMAIL);
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(/\/library/, { timeout: 40_000 });
  }).toPass({ timeout: 120_000 });
}

/** Null when the page is no wider than the screen, else the two widths. */
const sideways = (page: Page) => page.evaluate(() => (document.documentElement.scrollWidth > document.documentElement.clientWidth ? `${document.documentElement.scrollWidth} > ${document.documentElement.clientWidth}` : null));

test('a fresh account with a System deletes itself from /account, lands signed out, and cannot sign in again', async ({ page }) => {
  const signUp = await page.request.post('/api/v1/auth/sign-up', { data: { name: 'Departing Listener (invented)', email: EMAIL, password: PASSWORD } });
  expect(signUp.status(), await signUp.text()).toBe(201);
  await signIn(page);
  const personal = ((await (await page.request.get('/api/v1/workspaces')).json()).items as { id: string; name: string }[])[0]!;
  const saved = await page.request.post('/api/v1/systems', { data: { name: `Farewell den ${unique} (invented)`, document: lindenStreetDocument(), workspaceId: personal.id } });
  expect(saved.status(), await saved.text()).toBe(201);

  // Team: the only owner of a workspace nobody else is in is told why it cannot be left.
  await page.goto('/team');
  await expect(page.getByRole('heading', { name: 'Leave this workspace' })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByText('You are its only owner')).toBeVisible();
  await expect(page.getByRole('button', { name: /^Leave / })).toHaveCount(0);

  await page.goto('/account');
  await expect(page.getByRole('heading', { level: 2, name: 'Delete your account' })).toBeVisible({ timeout: 60_000 });
  await page.getByRole('button', { name: 'See what deleting my account would do' }).click();
  const owned = page.getByTestId('delete-plan-owned');
  await expect(owned).toHaveCount(1, { timeout: 30_000 });
  await expect(owned).toContainText(personal.name);
  await expect(owned).toContainText('Nobody else is in it, so it can only be deleted.');
  await expect(owned).toContainText('1 System and 1 saved revision');
  await expect(page.getByLabel('What happens to it')).toHaveValue('delete');

  // Checked as typed, before anything is sent.
  await page.getByRole('button', { name: 'Delete my account' }).click();
  await expect(page.locator('#delete-password-error')).toHaveText('enter your password');
  await expect(page.locator('#delete-confirm-error')).toHaveText('confirm with the words “delete my account”, typed exactly');

  // Phone width, and accessible, with the whole plan and its errors open.
  await page.setViewportSize({ width: 390, height: 844 });
  await expect.poll(() => sideways(page), { timeout: 10_000 }).toBeNull();
  expect(await seriousViolations(page, '/account with the deletion form')).toEqual([]);
  await page.setViewportSize({ width: 1440, height: 900 });

  // A wrong password is refused next to its field; nothing is deleted.
  await page.getByLabel('Your password').fill('not-my-password-at-all');
  await page.getByLabel('Type “delete my account” to confirm').fill('delete my account');
  await page.getByRole('button', { name: 'Delete my account' }).click();
  await expect(page.locator('#delete-password-error')).toHaveText('that is not your password', { timeout: 30_000 });
  expect((await page.request.get('/api/v1/workspaces')).status()).toBe(200);

  await page.getByLabel('Your password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Delete my account' }).click();
  await expect(page).toHaveURL(/\/\?account=deleted$/, { timeout: 60_000 });
  await expect(page.getByText('Your account is deleted')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole('link', { name: 'Sign in', exact: true })).toBeVisible();
  expect((await page.request.get('/api/v1/workspaces')).status()).toBe(401);

  await page.goto('/sign-in');
  await page.waitForLoadState('networkidle');
  await page.getByLabel('E-mail').fill(EMAIL);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible({ timeout: 30_000 });
  await expect(page).toHaveURL(/\/sign-in/);
});
