import { expect, test } from '@playwright/test';

const unique = () => `e2e-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}@example.test`;

test('sign up → sign out → sign in, in Chromium', async ({ page }) => {
  const email = unique();
  await page.goto('/sign-up');
  await page.getByLabel('Name').fill('Browser Person');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('short');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByText('password must be at least 10 characters')).toBeVisible();

  await page.getByLabel('Password').fill('a-long-enough-password');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page).toHaveURL(/\/library/);
  await expect(page.getByTestId('signed-in-as')).toHaveText('Browser Person');

  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('link', { name: 'Sign in', exact: true })).toBeVisible();

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('wrong-password-here');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible();
  await page.getByLabel('Password').fill('a-long-enough-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/);
  await expect(page.getByTestId('signed-in-as')).toHaveText('Browser Person');
});

test('a signed-out visitor is sent to sign in and back', async ({ page }) => {
  await page.goto('/team');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fteam/);
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/team$/);
  await expect(page.getByRole('heading', { name: 'Larkspur AV' })).toBeVisible();
});

test('the reset e-mail reaches the Dev mailbox and its link sets a new password', async ({ page }) => {
  const email = unique();
  await page.request.post('/api/v1/auth/sign-up', { data: { name: 'Mailbox Person', email, password: 'first-password-1' } });
  await page.goto('/forgot');
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByText('a reset link is on its way')).toBeVisible();

  await page.goto('/dev/mailbox');
  const message = page.getByTestId('dev-message').filter({ hasText: email }).first();
  await expect(message).toBeVisible();
  await message.getByRole('link', { name: /\/reset\// }).click();
  await page.getByLabel('New password').fill('second-password-2');
  await page.getByLabel('Repeat it').fill('second-password-2');
  await page.getByRole('button', { name: 'Change password' }).click();
  await expect(page).toHaveURL(/\/sign-in\?reset=1/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('second-password-2');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/);
});
