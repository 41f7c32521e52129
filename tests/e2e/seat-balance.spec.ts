import { expect, test, type Locator, type Page } from '@playwright/test';
import { seriousViolations } from './helpers/axe';
import { juniperLaneDocument } from '../../lib/demo/systems';
import { encodeDocument } from '../../lib/client/url-state';

// Seat balance (issue 15) in the browser: the search runs in a Web Worker with a progress bar while the page stays
// usable; its recommendation, applied, shows on Timing and (saved) on the Settings sheet; Cancel stops a run.
// The saved journey works on a copy of the invented demo System and deletes it after, so the demo stays as seeded.

/** "−1.9 dB" → -1.9, "15.62 ms" → 15.62 (true minus signs and thin spaces as the page writes them). */
const number = (text: string | null): number => Number((text ?? '').replace(/\u2212/g, '-').replace(/[^\d.-]/g, ''));
const read = async (l: Locator) => number(await l.textContent());

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/library/, { timeout: 60_000 });
}

async function openSeatBalance(page: Page) {
  await page.getByRole('tab', { name: 'Seat balance' }).click();
  await expect(page.getByRole('tab', { name: 'Seat balance' })).toHaveAttribute('aria-selected', 'true');
  await expect(page.getByTestId('sb-run')).toBeVisible({ timeout: 60_000 });
}

/** Ask for a ranked placement of `count` subs too: a run of several seconds, long enough to act while it runs. */
async function rankPositions(page: Page, count: number) {
  await page.getByTestId('sb-rank-positions').check();
  const field = page.getByTestId('sb-placement-count');
  await field.fill(String(count));
  await field.blur();
  await expect(field).toHaveValue(String(count));
}

test('Seat balance on the Juniper Lane screening room: runs in a worker, the page stays responsive, Apply reaches Timing and the Settings sheet', async ({ page }) => {
  test.setTimeout(300_000);
  await signIn(page);
  await page.getByRole('link', { name: 'Juniper Lane screening room' }).first().click();
  await page.waitForURL(/\/systems\/[^/?]+/, { timeout: 60_000 });
  const demoId = new URL(page.url()).pathname.split('/')[2];
  const copy = await page.request.post(`/api/v1/systems/${demoId}/duplicate`, { data: { name: 'Seat balance test copy (invented)' } });
  expect(copy.status()).toBe(201);
  const copyId = ((await copy.json()) as { id: string }).id;
  try {
    await page.goto(`/systems/${copyId}`);
    await openSeatBalance(page);
    await rankPositions(page, 3);

    await page.getByTestId('sb-run').click();
    const progress = page.getByRole('progressbar', { name: 'Seat balance progress' });
    await expect(progress).toBeVisible();
    await expect(progress).toHaveAttribute('aria-valuenow', /^\d+$/);
    // While the worker searches, a click lands at once: the units switch answers and the run is still going.
    const feet = page.getByRole('button', { name: 'Feet' });
    await feet.click();
    await expect(feet).toHaveAttribute('aria-pressed', 'true');
    await expect(progress).toBeVisible();
    await page.getByRole('button', { name: 'Metric' }).click();
    await expect(page.getByRole('button', { name: 'Metric' })).toHaveAttribute('aria-pressed', 'true');

    await expect(page.getByTestId('sb-after-mean')).toBeVisible({ timeout: 240_000 });
    await expect(progress).toHaveCount(0);
    await expect(page.getByTestId('sb-run-stats')).toContainText(/candidate settings evaluated/);
    const presentDb = await read(page.getByTestId('sb-present-mean'));
    const afterDb = await read(page.getByTestId('sb-after-mean'));
    expect(afterDb, `recommended ${afterDb} dB against present ${presentDb} dB`).toBeLessThan(presentDb);
    await expect(page.getByTestId('sb-placement-table').locator('tbody tr').first()).toBeVisible();
    await expect(page.getByTestId('sb-placement-plan')).toBeVisible();

    const subs = await page.getByTestId('sb-settings').locator('tbody tr').count();
    expect(subs).toBe(2);
    const recommended: { delayMs: number; gainDb: number; polarity: string }[] = [];
    for (let k = 0; k < subs; k++) {
      recommended.push({
        delayMs: await read(page.getByTestId(`sb-rec-delay-${k}`)),
        gainDb: await read(page.getByTestId(`sb-rec-gain-${k}`)),
        polarity: ((await page.getByTestId(`sb-rec-polarity-${k}`).textContent()) ?? '').trim(),
      });
    }
    // The demo's subs are all at 0 ms, 0 dB, normal: the recommendation changes at least one of them.
    expect(recommended.some((r) => r.delayMs !== 0 || r.gainDb !== 0 || r.polarity !== 'normal')).toBe(true);
    await page.getByTestId('sb-apply').click();
    await expect(page.getByText('Applied to the System')).toBeVisible();

    await page.getByRole('tab', { name: 'Timing' }).click();
    await expect(page.getByTestId('timing-arrivals')).toBeVisible({ timeout: 60_000 });
    for (let k = 0; k < subs; k++) {
      expect(await read(page.getByTestId(`timing-sub-${k}-own-delay`))).toBe(recommended[k]!.delayMs);
      expect(await read(page.getByTestId(`timing-sub-${k}-gain`))).toBe(recommended[k]!.gainDb);
      await expect(page.getByTestId(`timing-sub-${k}-polarity`)).toHaveText(recommended[k]!.polarity);
    }
    await expect(page.getByTestId('timing-seat-balance-note')).toBeVisible();

    await page.getByTestId('save-button').click();
    await expect(page.getByText('all changes saved')).toBeVisible({ timeout: 60_000 });
    await page.goto(`/systems/${copyId}/sheet`);
    const delays = page.locator('[data-testid^=sheet-sb-delay-]');
    await expect(delays).toHaveCount(subs);
    for (let k = 0; k < subs; k++) {
      expect(await read(delays.nth(k))).toBe(recommended[k]!.delayMs);
      expect(await read(page.locator('[data-testid^=sheet-sb-gain-]').nth(k))).toBe(recommended[k]!.gainDb);
      await expect(page.locator('[data-testid^=sheet-sb-polarity-]').nth(k)).toHaveText(recommended[k]!.polarity);
    }
    await expect(page.getByTestId('sheet-sb-system-mean').filter({ visible: true })).toBeVisible();
  } finally {
    expect((await page.request.delete(`/api/v1/systems/${copyId}`)).status()).toBe(200);
  }
});

test('Cancel stops a Seat balance run: no answer, the Run button back', async ({ page }) => {
  test.setTimeout(120_000);
  await page.goto(`/systems/new?panel=seat-balance&s=${encodeDocument(juniperLaneDocument())}`);
  await openSeatBalance(page);
  await rankPositions(page, 3);
  await page.getByTestId('sb-run').click();
  const progress = page.getByRole('progressbar', { name: 'Seat balance progress' });
  await expect(progress).toBeVisible();
  await page.getByTestId('sb-cancel').click();
  await expect(progress).toHaveCount(0);
  await expect(page.getByTestId('sb-cancel')).toHaveCount(0);
  await expect(page.getByTestId('sb-run')).toHaveText('Run');
  await expect(page.getByText('Cancelled: nothing was changed.')).toBeVisible();
  // The worker was ended: nothing arrives later either, neither progress nor an answer (the whole run takes seconds).
  await page.waitForTimeout(8_000);
  await expect(progress).toHaveCount(0);
  await expect(page.getByText('Cancelled: nothing was changed.')).toBeVisible();
  await expect(page.getByTestId('sb-after')).toHaveCount(0);
  await expect(page.getByTestId('sb-run-stats')).toHaveCount(0);
});

test('Seat balance with an answer at 390 px: nothing scrolls sideways, and axe finds no serious violation', async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`/systems/new?panel=seat-balance&s=${encodeDocument(juniperLaneDocument())}`);
  await openSeatBalance(page);
  await rankPositions(page, 2);
  await page.getByTestId('sb-run').click();
  await expect(page.getByTestId('sb-placement-table')).toBeVisible({ timeout: 120_000 });
  const widths = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  expect(widths.scroll, `page ${widths.scroll} px wide in a ${widths.client} px window`).toBeLessThanOrEqual(widths.client);
  expect(await seriousViolations(page, 'Seat balance with an answer', '[role=tabpanel]')).toEqual([]);
});

test('Seat balance from measurements on a copy of the demo System: what is missing, then the files of the workspace, a measured answer, Apply', async ({ page }) => {
  test.setTimeout(240_000);
  await signIn(page);
  await page.getByRole('link', { name: 'Juniper Lane screening room' }).first().click();
  await page.waitForURL(/\/systems\/[^/?]+/, { timeout: 60_000 });
  const demoId = new URL(page.url()).pathname.split('/')[2];
  const copy = await page.request.post(`/api/v1/systems/${demoId}/duplicate`, { data: { name: 'Seat balance measured test copy (invented)' } });
  expect(copy.status()).toBe(201);
  const copyId = ((await copy.json()) as { id: string }).id;
  try {
    await page.goto(`/systems/${copyId}`);
    await openSeatBalance(page);
    await page.getByTestId('sb-source-measured').check();
    // The demo's invented files were uploaded for the original System: the copy has none of its own.
    await expect(page.getByTestId('sb-measured-reason')).toContainText('no measurement', { timeout: 60_000 });
    const pairs = page.getByTestId('sb-measured-pairs');
    await expect(pairs.locator('tbody tr')).toHaveCount(2);
    await expect(pairs).toContainText('Sub front left');
    await expect(pairs).toContainText('Row 1 centre (MLP)');
    await expect(pairs).toContainText('missing');
    expect(await seriousViolations(page, 'Seat balance from measurements, files missing', '[role=tabpanel]')).toEqual([]);

    await page.getByTestId('sb-measured-scope').selectOption('workspace');
    await page.getByTestId('sb-run').click();
    const progress = page.getByRole('progressbar', { name: 'Seat balance progress' });
    await expect(progress).toBeVisible();
    await expect(page.getByTestId('sb-after-mean')).toBeVisible({ timeout: 180_000 });
    await expect(progress).toHaveCount(0);
    await expect(page.getByRole('heading', { name: /Seat-to-seat spread, .*measured at the seats/ })).toBeVisible();
    await expect(page.getByRole('heading', { name: /The seats’ bass, measured at the seats/ })).toBeVisible();
    const presentDb = await read(page.getByTestId('sb-present-mean'));
    const afterDb = await read(page.getByTestId('sb-after-mean'));
    expect(afterDb, `recommended ${afterDb} dB against present ${presentDb} dB, measured`).toBeLessThan(presentDb);
    await page.getByTestId('sb-measured-used').locator('summary').click();
    await expect(page.getByTestId('sb-measured-used').locator('li')).toHaveCount(6);
    await expect(page.getByTestId('sb-measured-used')).toContainText('Sub right wall alone (invented)');
    expect(await seriousViolations(page, 'Seat balance from measurements, answer', '[role=tabpanel]')).toEqual([]);

    // Apply on the copy (not saved): Timing shows each sub's delay, gain and polarity as the table gave them.
    const recommended = [];
    for (let k = 0; k < 2; k++) recommended.push({ delayMs: await read(page.getByTestId(`sb-rec-delay-${k}`)), gainDb: await read(page.getByTestId(`sb-rec-gain-${k}`)) });
    await page.getByTestId('sb-apply').click();
    await expect(page.getByText('Applied to the System')).toBeVisible();
    await page.getByRole('tab', { name: 'Timing' }).click();
    await expect(page.getByTestId('timing-arrivals')).toBeVisible({ timeout: 60_000 });
    for (let k = 0; k < 2; k++) {
      expect(await read(page.getByTestId(`timing-sub-${k}-own-delay`))).toBe(recommended[k]!.delayMs);
      expect(await read(page.getByTestId(`timing-sub-${k}-gain`))).toBe(recommended[k]!.gainDb);
    }
  } finally {
    expect((await page.request.delete(`/api/v1/systems/${copyId}`)).status()).toBe(200);
  }
});

test('Seat balance from measurements needs a signed-in, saved System: the switch is disabled with the reason', async ({ page }) => {
  await page.goto(`/systems/new?panel=seat-balance&s=${encodeDocument(juniperLaneDocument())}`);
  await openSeatBalance(page);
  await expect(page.getByTestId('sb-source-measured')).toBeDisabled();
  await expect(page.getByTestId('sb-source-reason')).toContainText('Sign in');
  await expect(page.getByTestId('sb-source-model')).toBeChecked();
});
