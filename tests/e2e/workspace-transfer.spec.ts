import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { seriousViolations } from './helpers/axe';

/**
 * Workspace export and import from the Team page (issue 19): the demo owner exports the invented "Larkspur AV"; another
 * account (signed up for the test, so the demo account's own list stays as it was) imports the file as a new
 * workspace, sees what was created and opens an imported System. The Library's "Export with history" downloads one
 * System. The Team page with an import's answer is checked with axe and at 390 px for sideways scrolling.
 */
test.describe.configure({ timeout: 240_000 });

const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const PASSWORD = 'a-long-password-1';

async function signIn(page: Page, email: string, password: string) {
  await expect(async () => {
    await page.goto('/sign-in');
    await page.waitForLoadState('networkidle');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(/\/library/, { timeout: 40_000 });
  }).toPass({ timeout: 120_000 });
}

async function openTeam(page: Page) {
  await page.goto('/team');
  await expect(page.getByRole('heading', { name: 'Export and import' })).toBeVisible({ timeout: 60_000 });
}

/** True when the page is no wider than its window. */
const fitsWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= document.documentElement.clientWidth);

test('export the demo workspace, import it as a new workspace of another account, open an imported System', async ({ page, browser }) => {
  await signIn(page, 'demo@seamline.test', 'seamline-demo');
  await openTeam(page);
  await page.getByRole('button', { name: /^Larkspur AV/ }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Larkspur AV' })).toBeVisible();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export workspace Larkspur AV' }).click()]);
  expect(download.suggestedFilename()).toMatch(/^seamline-larkspur-av-\d{4}-\d{2}-\d{2}\.json$/);
  const path = await download.path();
  const file = JSON.parse(await readFile(path, 'utf8'));
  expect(file.format).toBe('seamline-workspace');
  expect(file.systems.length).toBeGreaterThan(0);
  const revisions = file.systems.reduce((n: number, s: { revisions: unknown[] }) => n + s.revisions.length, 0);

  // Another account brings the file in.
  const email = `transfer-${unique}@example.test`;
  const signUp = await page.request.post('/api/v1/auth/sign-up', { data: { name: 'Transfer walk (invented)', email, password: PASSWORD } });
  expect(signUp.status(), await signUp.text()).toBe(201);
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const other = await context.newPage();
  await signIn(other, email, PASSWORD);
  await openTeam(other);
  await other.getByLabel('Import a workspace file').setInputFiles(path);
  await other.getByRole('button', { name: 'Import as a new workspace' }).click();
  const created = other.getByTestId('import-created');
  await expect(created).toBeVisible({ timeout: 90_000 });
  const plural = (n: number, one: string) => `${n} ${n === 1 ? one : `${one}s`}`;
  await expect(created).toContainText(`${plural(file.systems.length, 'System')} (${plural(revisions, 'revision')})`);
  await expect(created).toContainText(plural(file.measurements.length, 'measurement'));
  await expect(other.getByTestId('import-result')).toContainText('not a member here');

  // The page with the answer: nothing sideways at 390 px, nothing serious for axe.
  expect(await fitsWidth(other), 'the Team page scrolls sideways at 390 px').toBe(true);
  expect(await seriousViolations(other, 'team with an import')).toEqual([]);

  // The new workspace is in the list, and an imported System opens in the editor.
  await other.getByRole('button', { name: 'Show Larkspur AV' }).click();
  await expect(other.getByRole('heading', { level: 1, name: 'Larkspur AV' })).toBeVisible();
  const firstName = file.systems[0].name as string;
  await other.getByTestId('import-result').getByRole('link', { name: firstName, exact: true }).click();
  await expect(other).toHaveURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 60_000 });
  await expect(other.getByLabel('System name')).toHaveValue(firstName, { timeout: 60_000 });

  // The same file fills the account's own workspace while that holds nothing; a second time it is refused, naming why.
  const personal = "Transfer walk (invented)'s workspace";
  await openTeam(other);
  await other.getByRole('button', { name: new RegExp(`^${personal.replace(/[()]/g, '\\$&')}`) }).click();
  await expect(other.getByRole('heading', { level: 1, name: personal })).toBeVisible();
  for (const attempt of ['empty', 'filled']) {
    await other.getByLabel('Import a workspace file').setInputFiles(path);
    await other.getByRole('button', { name: `Import into ${personal}` }).click();
    if (attempt === 'empty') {
      await expect(other.getByTestId('import-created')).toContainText(`${plural(file.systems.length, 'System')} (${plural(revisions, 'revision')})`, { timeout: 90_000 });
      await expect(other.getByTestId('import-result')).toContainText(`Imported into ${personal}`);
    } else {
      await expect(other.getByTestId('workspace-transfer').getByText(/That workspace is not empty \(\d+ Systems/)).toBeVisible({ timeout: 60_000 });
    }
  }
  const lists = await Promise.all(
    [personal, 'Larkspur AV'].map(async (name) => {
      const all = (await (await other.request.get('/api/v1/workspaces')).json()).items as { id: string; name: string }[];
      const ws = all.find((w) => w.name === name)!;
      return ((await (await other.request.get(`/api/v1/systems?workspaceId=${ws.id}`)).json()).items as unknown[]).length;
    }),
  );
  expect(lists, 'the personal workspace holds the file once, like the imported one').toEqual([file.systems.length, file.systems.length]);
  await context.close();
});

test('the Library exports one System with its history for an editor', async ({ page }) => {
  await signIn(page, 'demo@seamline.test', 'seamline-demo');
  await page.getByRole('link', { name: 'History of Juniper Lane screening room' }).first().click();
  await expect(page).toHaveURL(/\/library\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export Juniper Lane screening room with history' }).click()]);
  expect(download.suggestedFilename()).toMatch(/^seamline-juniper-lane-screening-room-\d{4}-\d{2}-\d{2}\.json$/);
  const file = JSON.parse(await readFile(await download.path(), 'utf8'));
  expect(file.format).toBe('seamline-system');
  expect(file.system.name).toBe('Juniper Lane screening room');
  expect(file.system.revisions.length).toBeGreaterThan(0);
  await page.setViewportSize({ width: 390, height: 844 });
  expect(await fitsWidth(page), 'the History page scrolls sideways at 390 px').toBe(true);
});
