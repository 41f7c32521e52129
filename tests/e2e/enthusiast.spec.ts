/**
 * The enthusiast's story end to end (issue 5): sign up, open the editor, save to the Library,
 * share a link, open it signed out and see the plots, revoke it and see 404. Then the integrator's
 * part: the Settings sheet on print media, as a PDF on A4 and US Letter.
 */
import { expect, test, type Page } from '@playwright/test';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';

const OUT = path.join('test-results', 'enthusiast');
const PASSWORD = 'enthusiast-password-1';

async function signUp(page: Page, email: string) {
  await page.goto('/sign-up', { waitUntil: 'networkidle' });
  await page.getByLabel('Name').fill('Enthusiast (invented)');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: /create|sign up/i }).click();
  await page.waitForURL(/\/library/, { timeout: 60_000 });
}

/** Opens the Share dialog in the editor's toolbar, or from the System's Library row. */
async function openShareDialog(page: Page, systemName: string) {
  const inEditor = page.getByTestId('share-open');
  if ((await inEditor.count()) === 0) {
    await page.goto('/library', { waitUntil: 'networkidle' });
    await page.getByTestId('library-row').filter({ hasText: systemName }).getByTestId('share-open').click();
  } else {
    await inEditor.first().click();
  }
  await expect(page.getByRole('dialog', { name: 'Share a read-only link' })).toBeVisible();
}

test.describe.configure({ mode: 'serial' });

test('save, share, open signed out, revoke, 404; print the Settings sheet', async ({ page, browser }) => {
  test.setTimeout(240_000);
  mkdirSync(OUT, { recursive: true });
  const email = `enthusiast-${Date.now().toString(36)}@example.test`;
  await signUp(page, email);

  // The editor, then Save to Library: it creates the System and moves to its own address.
  await page.goto('/systems/new', { waitUntil: 'networkidle' });
  await page.getByRole('button', { name: 'Save to Library' }).click();
  await page.waitForURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 60_000 });
  const systemId = /\/systems\/([0-9a-f-]{36})/.exec(page.url())![1]!;
  const saved = await page.request.get(`/api/v1/systems/${systemId}`);
  expect(saved.status()).toBe(200);
  const systemName = (await saved.json()).name as string;

  // Share: create a link and read its address from the dialog.
  await openShareDialog(page, systemName);
  await page.getByTestId('share-create').click();
  const urlField = page.getByTestId('share-url').first();
  await expect(urlField).toHaveValue(/\/s\/[A-Za-z0-9_-]{43}$/);
  const shareUrl = await urlField.inputValue();
  const sharePath = new URL(shareUrl).pathname;

  // A fresh, signed-out browser sees the name, the plots and the Settings sheet.
  const visitor = await browser.newContext();
  const anon = await visitor.newPage();
  const first = await anon.goto(sharePath, { waitUntil: 'networkidle' });
  expect(first?.status()).toBe(200);
  await expect(anon.getByTestId('shared-name')).toHaveText(systemName);
  for (const panel of ['shared-blend', 'shared-timing', 'shared-modes']) {
    await expect(anon.getByTestId(panel).locator('svg').first()).toBeVisible({ timeout: 30_000 });
  }
  await expect(anon.getByRole('heading', { level: 2, name: 'Main channels' })).toBeVisible();
  await expect(anon.getByRole('link', { name: 'Sign in to copy to your Library' })).toBeVisible();
  await anon.screenshot({ path: path.join(OUT, 'shared-page.png'), fullPage: false });

  // Revoke; the visitor's reload is a 404 page.
  await page.getByTestId('share-revoke').first().click();
  await expect(page.getByText('The link was revoked')).toBeVisible();
  const after = await anon.reload({ waitUntil: 'networkidle' });
  expect(after?.status()).toBe(404);
  await expect(anon.getByTestId('shared-not-found')).toBeVisible();
  await visitor.close();

  // The integrator prints the Settings sheet: print media hides the controls and keeps the sheet.
  await page.goto(`/systems/${systemId}/sheet`, { waitUntil: 'networkidle' });
  await expect(page.getByRole('heading', { level: 1, name: systemName })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Print' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'CSV' })).toHaveAttribute('href', `/api/v1/systems/${systemId}/export?format=csv`);
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(page.getByRole('link', { name: 'Library' })).toBeHidden();
  await expect(page.getByRole('heading', { name: 'Subwoofers' })).toBeVisible();
  await expect(page.getByTestId('sheet-revision').filter({ visible: true })).toHaveText('1');
  await page.screenshot({ path: path.join(OUT, 'sheet-print-media.png'), fullPage: true });

  for (const format of ['A4', 'Letter'] as const) {
    if (format === 'Letter') {
      await page.emulateMedia({ media: 'screen' });
      await page.getByLabel('Paper').selectOption('letter');
      await page.emulateMedia({ media: 'print' });
    }
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    writeFileSync(path.join(OUT, `sheet-${format}.pdf`), pdf);
    const text = pdf.toString('latin1');
    expect(text.startsWith('%PDF-')).toBe(true);
    // The page box the @page rule asked for: A4 595 × 842 pt, US Letter 612 × 792 pt.
    const box = /\/MediaBox\s*\[\s*0\s+0\s+([\d.]+)\s+([\d.]+)\s*\]/.exec(text);
    expect(box, 'a MediaBox in the PDF').not.toBeNull();
    const [w, h] = [Number(box![1]), Number(box![2])];
    if (format === 'A4') expect([Math.round(w), Math.round(h)]).toEqual([595, 842]);
    else expect([Math.round(w), Math.round(h)]).toEqual([612, 792]);
    const pages = (text.match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    expect(pages).toBeGreaterThanOrEqual(1);
    expect(pages).toBeLessThanOrEqual(3);
  }
});
