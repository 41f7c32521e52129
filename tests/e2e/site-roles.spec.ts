import { expect, test } from '@playwright/test';
import { seriousViolations } from './helpers/axe';

/**
 * Site roles on the Users page (issue 19 follow-up): the demo site admin makes a freshly signed-up account a site admin,
 * after a confirm step, and then a member again; the stored role is read back through the API each time.
 */
test('the site admin makes an account a site admin and a member again on the Users page', async ({ page }) => {
  test.setTimeout(180_000);
  const stamp = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
  const email = `site-role-${stamp}@example.test`;
  // A name of this run alone: on a database kept between runs, earlier walks' accounts are still listed.
  const name = `Site role walk ${stamp} (invented)`;
  const signUp = await page.request.post('/api/v1/auth/sign-up', { data: { name, email, password: 'a-long-password-1' } });
  expect(signUp.status(), await signUp.text()).toBe(201);
  const id = ((await signUp.json()) as { id: string }).id;

  await page.goto('/sign-in');
  await page.waitForLoadState('networkidle');
  await page.getByLabel('E-mail').fill('admin@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/library/, { timeout: 60_000 });
  await page.goto('/admin/users');
  const role = page.getByTestId(`site-role-${id}`);
  await expect(role).toHaveText('member', { timeout: 60_000 });
  const stored = async () => ((await (await page.request.get('/api/v1/admin/users')).json()).items as { id: string; siteRole: string }[]).find((u) => u.id === id)?.siteRole;

  await page.getByRole('button', { name: `Make site admin: ${name}` }).click();
  const ask = page.getByRole('group', { name: `Make site admin: ${name}` });
  await expect(ask).toContainText('will manage every account on this site');
  expect(await seriousViolations(page, 'Users page, confirm step')).toEqual([]);
  await ask.getByRole('button', { name: 'Make site admin' }).click();
  await expect(role).toHaveText('site admin', { timeout: 30_000 });
  expect(await stored()).toBe('admin');

  await page.getByRole('button', { name: `Make member: ${name}` }).click();
  await page.getByRole('group', { name: `Make member: ${name}` }).getByRole('button', { name: 'Make member' }).click();
  await expect(role).toHaveText('member', { timeout: 30_000 });
  expect(await stored()).toBe('member');
});
