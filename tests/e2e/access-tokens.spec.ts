import { expect, test, type Page } from '@playwright/test';
import { seriousViolations } from './helpers/axe';
import { juniperLaneDocument } from '../../lib/demo/systems';

/**
 * Personal access tokens from the Account page (issue 18): make a read token for the invented demo workspace, use its
 * secret from a program (Playwright's own request context, no cookies), see its last use, revoke it, and see it refused.
 */
test.describe.configure({ timeout: 180_000 });

const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const SECRET_SHAPE = /^slp_[A-Za-z0-9_-]{43}$/;

async function signIn(page: Page) {
  await expect(async () => {
    await page.goto('/sign-in');
    await page.waitForLoadState('networkidle');
    await page.getByLabel('E-mail').fill('demo@seamline.test');
    await page.getByLabel('Password').fill('seamline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(/\/library/, { timeout: 40_000 });
  }).toPass({ timeout: 120_000 });
}

/** The id of the invented demo workspace, as the signed-in page's own session sees it. */
async function demoWorkspaceId(page: Page): Promise<string> {
  const res = await page.request.get('/api/v1/workspaces');
  expect(res.status(), await res.text()).toBe(200);
  const items: { id: string; name: string; role: string }[] = (await res.json()).items;
  const demo = items.find((w) => w.name === 'Larkspur AV');
  expect(demo, 'the demo user is a member of "Larkspur AV"').toBeTruthy();
  return demo!.id;
}

/** Fills the form on /account and answers the secret the highlighted box shows. */
async function makeToken(page: Page, name: string, workspaceId: string, scope: 'read' | 'read and write', expiry: string): Promise<string> {
  await page.getByLabel('Name', { exact: true }).fill(name);
  await page.getByLabel('Workspace').selectOption(workspaceId);
  await page.getByRole('radio', { name: new RegExp(`^${scope} —`) }).check();
  await page.getByLabel('Expires').selectOption({ label: expiry });
  await page.getByRole('button', { name: 'Make token' }).click();
  const box = page.getByTestId('new-secret');
  await expect(box).toBeVisible({ timeout: 30_000 });
  await expect(box).toContainText('You will not see it again: copy it now and keep it like a password');
  const secret = ((await box.getByTestId('token-secret').textContent()) ?? '').trim();
  expect(secret).toMatch(SECRET_SHAPE);
  return secret;
}

/** Tidy up: revokes this run's active tokens through the API (tokens are never deleted, only revoked). */
async function revokeMine(page: Page) {
  const res = await page.request.get('/api/v1/tokens');
  expect(res.status(), await res.text()).toBe(200);
  const mine = ((await res.json()).items as { id: string; status: string; name: string }[]).filter((t) => t.status === 'active' && t.name.includes(unique));
  for (const t of mine) expect((await page.request.delete(`/api/v1/tokens/${t.id}`)).status()).toBe(200);
}

async function openAccount(page: Page) {
  await page.goto('/account');
  await expect(page.getByRole('heading', { level: 1, name: 'Account' })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole('button', { name: 'Make token' })).toBeVisible({ timeout: 60_000 });
}

test('a read token made on /account reads the demo Systems, cannot write, shows its last use and stops after Revoke', async ({ page, request, context, baseURL }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: new URL(baseURL ?? 'http://127.0.0.1:3000').origin });
  await signIn(page);
  const workspaceId = await demoWorkspaceId(page);

  // Reached from the header, showing who is signed in.
  await page.getByRole('link', { name: 'Account', exact: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Account' })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('account-email')).toHaveText('demo@seamline.test');

  // The name is checked as it is typed.
  const nameField = page.getByLabel('Name', { exact: true });
  await nameField.fill('x');
  await nameField.fill('');
  await expect(page.getByText('name is required')).toBeVisible();

  const name = `Checklist ${unique} (invented)`;
  const secret = await makeToken(page, name, workspaceId, 'read', 'in 30 days');
  await expect(page.getByTestId('token-curl')).toHaveText(`curl -H "Authorization: Bearer ${secret}" ${new URL(page.url()).origin}/api/v1/systems`);
  await page.getByTestId('new-secret').getByRole('button', { name: 'Copy' }).click();
  await expect(page.getByTestId('new-secret').getByRole('status')).toHaveText('Copied.');
  expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(secret);

  const row = page.getByTestId('token-row').filter({ hasText: name });
  await expect(row).toHaveAttribute('data-status', 'active');
  await expect(row).toContainText('Larkspur AV');
  await expect(row.getByTestId('token-last-used')).toHaveText('never');
  await expect(row).toContainText(secret.slice(0, 8)); // the hint: the secret's first characters

  // Dismissing forgets the secret: it is nowhere on the page any more.
  await page.getByRole('button', { name: 'Done, I have copied it' }).click();
  await expect(page.getByTestId('new-secret')).toHaveCount(0);
  expect(await page.content()).not.toContain(secret);

  // A program with the secret (no cookies): reads the demo Systems, may not create one.
  const bearer = { Authorization: `Bearer ${secret}` };
  const list = await request.get('/api/v1/systems', { headers: bearer });
  expect(list.status(), await list.text()).toBe(200);
  const names = ((await list.json()).items as { name: string }[]).map((s) => s.name);
  expect(names).toContain('Juniper Lane screening room');
  const create = await request.post('/api/v1/systems', { headers: bearer, data: { name: `Refused ${unique} (invented)`, document: juniperLaneDocument(), workspaceId } });
  if (create.ok()) await page.request.delete(`/api/v1/systems/${(await create.json()).id}`); // a wrongly made System does not stay
  expect(create.status(), await create.text()).toBe(403);

  // Its last use shows after a reload.
  await page.reload();
  await expect(row.getByTestId('token-last-used')).toHaveText(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC$/, { timeout: 60_000 });
  await expect(row).toContainText('read');
  await expect(row).not.toContainText('read and write');

  // Revoke, with its confirm step; then the same call is refused.
  await row.getByRole('button', { name: `Revoke ${name}` }).click();
  const dialog = page.getByRole('dialog', { name: `Revoke “${name}”?` });
  await expect(dialog).toBeVisible();
  await dialog.getByRole('button', { name: 'Revoke', exact: true }).click();
  await expect(row).toHaveAttribute('data-status', 'revoked', { timeout: 30_000 });
  await expect(row.getByRole('button', { name: /Revoke/ })).toHaveCount(0);
  const after = await request.get('/api/v1/systems', { headers: bearer });
  expect(after.status(), await after.text()).toBe(401);
});

test('axe: no serious or critical violation on /account, with a new secret shown and a revoked token listed', async ({ page }) => {
  await signIn(page);
  const workspaceId = await demoWorkspaceId(page);
  await openAccount(page);
  const revokedName = `Axe check, revoked ${unique} (invented)`;
  await makeToken(page, revokedName, workspaceId, 'read and write', 'never');
  await revokeMine(page);
  await page.reload();
  await expect(page.getByTestId('token-row').filter({ hasText: revokedName })).toHaveAttribute('data-status', 'revoked', { timeout: 60_000 });
  await makeToken(page, `Axe check, shown ${unique} (invented)`, workspaceId, 'read', 'in 7 days');
  expect(await seriousViolations(page, '/account')).toEqual([]);
  await revokeMine(page);
});

test('a viewer workspace offers read only, and a refusal from the server shows next to its field', async ({ page }) => {
  await signIn(page);
  // The browser is told it is a viewer in one invented workspace, and the server's answer to the POST is a refusal.
  const viewerWorkspace = { id: '00000000-0000-4000-8000-00000000beef', name: 'Thistle Row viewers (invented)', personal: false, role: 'viewer', memberCount: 3 };
  await page.route('**/api/v1/workspaces', (r) => r.fulfill({ json: { items: [viewerWorkspace] } }));
  let sent: unknown = null;
  await page.route('**/api/v1/tokens', async (r) => {
    if (r.request().method() !== 'POST') return r.fallback();
    sent = r.request().postDataJSON();
    return r.fulfill({ status: 400, json: { error: { code: 'invalid', message: 'The request is not valid.', issues: [{ path: 'name', message: 'that name is refused (invented)' }] } } });
  });
  await openAccount(page);
  await expect(page.getByText('You are a viewer here, so a token for this workspace can only read.')).toBeVisible();
  await expect(page.getByRole('radio', { name: /^read and write —/ })).toBeDisabled();
  await expect(page.getByRole('radio', { name: /^read —/ })).toBeChecked();
  await page.getByLabel('Name', { exact: true }).fill(`Viewer check ${unique} (invented)`);
  await page.getByLabel('Expires').selectOption({ label: 'never' });
  await page.getByRole('button', { name: 'Make token' }).click();
  await expect(page.getByText('that name is refused (invented)')).toBeVisible();
  await expect(page.getByLabel('Name', { exact: true })).toHaveAttribute('aria-invalid', 'true');
  expect(sent).toEqual({ name: `Viewer check ${unique} (invented)`, workspaceId: viewerWorkspace.id, scope: 'read', expiresInDays: null });
  await expect(page.getByTestId('new-secret')).toHaveCount(0);
});

test.describe('on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test('/account does not scroll sideways at 390 px, with a long token name and the secret shown', async ({ page }) => {
    await signIn(page);
    const workspaceId = await demoWorkspaceId(page);
    await openAccount(page);
    const name = `${unique} a long token name for a commissioning checklist that wraps on a phone (invented)`.slice(0, 80);
    await makeToken(page, name, workspaceId, 'read', 'in 90 days');
    await expect(page.getByTestId('token-row').filter({ hasText: name })).toBeVisible();
    const widths = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
    expect(widths.scroll, `scrollWidth ${widths.scroll} px > clientWidth ${widths.client} px`).toBeLessThanOrEqual(widths.client);
    await revokeMine(page);
  });
});
