/**
 * No silent loss or change of the user's work.
 * - "Sign in to save" (and signing up from there) comes back to the same anonymous System, every edit and the name
 *   included, and Save puts it in the Library — also when the document is too long for the sign-in link.
 * - Changing the room never moves a seat: a room too short for the MLP shows an error instead of angles and seat
 *   responses, and growing it back gives the same included angle as before.
 * - A speaker outside the room (L at x = 40 m) shows that error, never an included angle.
 */
import { expect, test, type Page } from '@playwright/test';
import { decodeDocument, encodeDocument } from '../../lib/client/url-state';
import { newSystemDocument } from '../../lib/demo/systems';

const PASSWORD = 'keep-work-password-1';
const unique = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

async function makeAccount(page: Page): Promise<string> {
  const email = `keep-work-${unique()}@example.test`;
  const res = await page.request.post('/api/v1/auth/sign-up', { data: { name: 'Keeper (invented)', email, password: PASSWORD } });
  expect(res.status(), await res.text()).toBe(201);
  return email;
}

async function saveAndFindInLibrary(page: Page, name: string) {
  const save = page.getByTestId('save-button');
  await expect(save).toHaveText('Save to Library');
  await expect(save).toBeEnabled();
  await save.click();
  await page.waitForURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 120_000 });
  await expect(page.getByLabel('System name')).toHaveValue(name);
  await page.goto('/library');
  // Visible rows only: the router may keep an earlier Library page, hidden, beside the new one.
  await expect(page.getByTestId('library-row').filter({ hasText: name, visible: true })).toBeVisible({ timeout: 60_000 });
}

test('Sign in to save: back in the editor with the same name, crossover and room; Save puts it in the Library', async ({ page }) => {
  test.setTimeout(300_000);
  const email = await makeAccount(page);
  const name = `Attic cinema ${unique()} (invented)`;

  await page.goto('/systems/new');
  await page.getByLabel('System name').fill(name);
  await page.getByRole('tab', { name: 'Blend' }).click();
  await page.getByRole('spinbutton', { name: /Crossover frequency/ }).fill('110');
  await page.getByRole('tab', { name: 'Modes' }).click();
  await page.getByTestId('room-length').fill('7.2');
  await expect(page.getByTestId('mode-table').locator('tbody tr').first().locator('td').first()).toHaveText('23.83', { timeout: 60_000 });

  await page.getByRole('link', { name: 'Sign in to save' }).click();
  await page.waitForURL((u) => u.pathname === '/sign-in', { timeout: 60_000 });
  const callback = new URL(page.url()).searchParams.get('callbackUrl') ?? '';
  expect(callback.startsWith('/systems/new?')).toBe(true);
  expect(new URL(callback, page.url()).searchParams.get('s')).toBeTruthy(); // the whole document travels with the link

  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => u.pathname === '/systems/new', { timeout: 120_000 });

  await expect(page.getByLabel('System name')).toHaveValue(name);
  await expect(page.getByTestId('resume-notice')).toBeVisible();
  await expect(page.getByRole('tab', { name: 'Modes' })).toHaveAttribute('aria-selected', 'true');
  await expect(page.getByTestId('room-length')).toHaveValue('7.2');
  await page.getByRole('tab', { name: 'Blend' }).click();
  await expect(page.getByRole('spinbutton', { name: /Crossover frequency/ })).toHaveValue('110');

  await saveAndFindInLibrary(page, name);
});

test('a System too long for the sign-in link survives signing up (kept in the tab), notes and all', async ({ page }) => {
  test.setTimeout(300_000);
  const name = `Long notes ${unique()} (invented)`;
  // Varied text, so lz-string cannot shrink it below the link's limit.
  const notes = Array.from({ length: 1200 }, (_, i) => `seat${(i * 7919) % 10007}`).join(' ');
  const doc = { ...newSystemDocument(), room: { ...newSystemDocument().room, lengthM: 7.2 }, notes };
  await page.goto(`/systems/new?panel=modes&s=${encodeDocument(doc)}&name=${encodeURIComponent(name)}`);
  await expect(page.getByTestId('room-length')).toHaveValue('7.2');

  const link = page.getByRole('link', { name: 'Sign in to save' });
  const href = (await link.getAttribute('href')) ?? '';
  expect(href.length).toBeLessThan(300);
  expect(decodeURIComponent(href)).toContain('restore=1');
  await link.click();
  await page.waitForURL((u) => u.pathname === '/sign-in', { timeout: 60_000 });

  await page.getByRole('link', { name: 'Create an account' }).click();
  await page.waitForURL((u) => u.pathname === '/sign-up' && u.searchParams.has('callbackUrl'), { timeout: 60_000 });
  await page.getByLabel('Name').fill('Long-notes keeper (invented)');
  await page.getByLabel('E-mail').fill(`keep-work-${unique()}@example.test`);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL((u) => u.pathname === '/systems/new', { timeout: 120_000 });

  await expect(page.getByLabel('System name')).toHaveValue(name);
  await expect(page.getByTestId('room-length')).toHaveValue('7.2');
  // The editor's address holds the whole document again, notes included.
  await expect.poll(() => decodeDocument(new URL(page.url()).searchParams.get('s')).doc?.notes ?? '', { timeout: 10_000 }).toBe(notes);

  await saveAndFindInLibrary(page, name);
});

test('a room too short for the MLP shows an error instead of numbers; growing it back leaves the seat and the angle as they were', async ({ page }) => {
  test.setTimeout(240_000);
  await page.goto('/systems/new');
  await page.getByRole('tab', { name: 'Layout' }).click();
  const angle = page.getByTestId('included-angle');
  await expect(angle).toHaveText(/\d+\.\d°/, { timeout: 60_000 });
  const before = (await angle.textContent()) ?? '';
  await page.getByTestId('layout-item-select').selectOption('seat:mlp');
  await expect(page.getByTestId('seat-y')).toHaveValue('3.7');

  // 6.4 → 1.5 m: the MLP stays at y = 3.7 m, outside, and says so.
  await page.getByRole('tab', { name: 'Modes' }).click();
  await page.getByTestId('room-length').fill('1.5');
  const message = 'Row 1 centre (MLP) is 3.7 m into a 1.5 m long room';
  await expect(page.getByTestId('outside-room')).toContainText(message);
  await expect(page.getByTestId('seat-response-blocked')).toContainText(message);

  await page.getByRole('tab', { name: 'Layout' }).click();
  await expect(page.getByTestId('outside-room')).toContainText(message);
  await expect(page.getByTestId('outside-seats.1')).toContainText(message);
  await expect(page.getByTestId('included-angle')).toHaveCount(0);
  await page.getByTestId('layout-item-select').selectOption('seat:mlp');
  await expect(page.getByTestId('seat-y')).toHaveValue('3.7');
  await expect(page.getByTestId('seat-y')).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByTestId('apply-template')).toBeDisabled(); // nothing is placed around an MLP outside the room

  await page.getByRole('tab', { name: 'Timing' }).click();
  await expect(page.getByTestId('panel-outside-room')).toContainText(message);
  await expect(page.getByText('This System cannot be saved yet')).toBeVisible();

  // 1.5 → 6.4 m: nothing to report, and the same angle as before.
  await page.getByRole('tab', { name: 'Modes' }).click();
  await page.getByTestId('room-length').fill('6.4');
  await expect(page.getByTestId('outside-room')).toHaveCount(0);
  await page.getByRole('tab', { name: 'Layout' }).click();
  await expect(page.getByTestId('included-angle')).toHaveText(before, { timeout: 60_000 });
  await page.getByTestId('layout-item-select').selectOption('seat:mlp');
  await expect(page.getByTestId('seat-y')).toHaveValue('3.7');
});

test('L at x = 40 m in a 4.9 m wide room: the error, not an included angle', async ({ page }) => {
  test.setTimeout(180_000);
  const doc = newSystemDocument();
  const far = { ...doc, speakers: doc.speakers.map((s) => (s.channel === 'L' ? { ...s, xM: 40 } : s)) };
  await page.goto(`/systems/new?panel=layout&s=${encodeDocument(far)}&name=${encodeURIComponent('Far left (invented)')}`);
  await expect(page.getByLabel('System name')).toHaveValue('Far left (invented)'); // the link opened this System, not a fresh one
  const message = 'L is 40 m across in a 4.9 m wide room';
  await expect(page.getByTestId('outside-room')).toContainText(message);
  await expect(page.getByTestId('included-angle')).toHaveCount(0);
  await page.getByRole('tab', { name: 'Blend' }).click();
  await expect(page.getByTestId('panel-outside-room')).toContainText(message);
});

test('the sign-in form only returns to this site: a "/\\host" callbackUrl lands on the Library instead', async ({ page }) => {
  test.setTimeout(180_000);
  const email = await makeAccount(page);
  const origin = new URL(test.info().project.use.baseURL ?? 'http://127.0.0.1:3000').origin;
  await page.goto(`/sign-in?callbackUrl=${encodeURIComponent('/\\evil.example/steal')}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => u.pathname === '/library' || u.hostname.includes('evil'), { timeout: 120_000 }).catch(() => undefined);
  const landed = new URL(page.url());
  expect(landed.origin).toBe(origin);
  expect(landed.pathname).toBe('/library');
});
