import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { crossoverBiquads } from '../../dsp';
import { seriousViolations } from './helpers/axe';
import { encodeDocument } from '../../lib/client/url-state';
import { juniperLaneDocument } from '../../lib/demo/systems';

// Processor filters (issue 16) in the browser, on a copy of the invented demo System (deleted after, so the demo stays
// as seeded): pick 96 kHz, copy a section, download the CSV, design and apply the subs' EQ, save, and find the same
// sections on the Settings sheet.

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/library/, { timeout: 60_000 });
}

test('Processor filters on the Juniper Lane screening room: 96 kHz, a section copied, the CSV downloaded, the subs’ EQ designed and applied, the same sections on the Settings sheet', async ({ page, context }) => {
  test.setTimeout(240_000);
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await signIn(page);
  await page.getByRole('link', { name: 'Juniper Lane screening room' }).first().click();
  await page.waitForURL(/\/systems\/[^/?]+/, { timeout: 60_000 });
  const demoId = new URL(page.url()).pathname.split('/')[2];
  const copy = await page.request.post(`/api/v1/systems/${demoId}/duplicate`, { data: { name: 'Processor filters test copy (invented)' } });
  expect(copy.status()).toBe(201);
  const copyId = ((await copy.json()) as { id: string }).id;
  try {
    await page.goto(`/systems/${copyId}`);
    await page.getByRole('tab', { name: 'Processor filters' }).click();
    await expect(page.getByTestId('pf-convention')).toHaveText('H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)', { timeout: 60_000 });

    await page.getByRole('button', { name: '96 kHz' }).click();
    await expect(page.getByRole('button', { name: '96 kHz' })).toHaveAttribute('aria-pressed', 'true');
    await expect(page.getByRole('heading', { name: 'Every output at 96 kHz' })).toBeVisible();

    // The demo's mains: Butterworth 2nd order high-pass at 80 Hz, one section, at full precision.
    const demo = juniperLaneDocument();
    expect(demo.bassManagement.mainsHighpass).toEqual({ family: 'butterworth', order: 2 });
    const [hp] = crossoverBiquads({ kind: 'crossover', family: 'butterworth', order: 2, response: 'highpass', cornerHz: demo.bassManagement.crossoverHz }, 96000);
    const line = `b0=${hp!.b0} b1=${hp!.b1} b2=${hp!.b2} a1=${hp!.a1} a2=${hp!.a2}`;
    const mains = page.locator('[data-testid^="pf-output-main-"]');
    await expect(mains).toHaveCount(1); // all eleven main channels run the same high-pass: one card
    await expect(mains).toContainText('Main channels L, C, R, SL, SR, SBL, SBR, TFL, TFR, TRL, TRR');
    const mainId = ((await mains.getAttribute('data-testid')) ?? '').replace('pf-output-', '');
    const row = page.getByTestId(`pf-section-${mainId}-1`);
    for (const c of ['b0', 'b1', 'b2', 'a1', 'a2'] as const) await expect(row.locator(`[data-coefficient=${c}]`)).toHaveText(String(hp![c]));

    await page.getByTestId(`pf-copy-${mainId}-1`).click();
    await expect(row.getByRole('status')).toHaveText('Copied');
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(line);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('pf-download-csv').click()]);
    expect(download.suggestedFilename()).toBe('processor-filters-96000-hz.csv');
    const csv = readFileSync((await download.path())!, 'utf8').split('\r\n');
    expect(csv[0]).toBe('output,role,filter,section,b0,b1,b2,a1,a2,sampleRateHz');
    expect(csv[1]).toBe(`L,crossover,"High-pass, Butterworth 2nd order (12 dB/oct), 80 Hz",1,${hp!.b0},${hp!.b1},${hp!.b2},${hp!.a1},${hp!.a2},96000`);
    // 11 mains × 1, 2 subs × 2 (LR4), the LFE × 2.
    expect(csv.filter((l) => l !== '')).toHaveLength(1 + 11 + 4 + 2);

    // The EQ designer on the demo's subs (model at the MLP): the residual after no worse than before, the filters in a
    // table; Apply writes them to every sub's EQ, and each sub output's sections grow by one per filter.
    const subSections = page.locator('[data-testid^="pf-section-sub-sub1-"]');
    await expect(subSections).toHaveCount(2); // LR4 low-pass: two sections, no EQ yet
    await expect(page.getByTestId('pf-eq-sub1')).toContainText('No EQ on this sub.');
    await page.getByTestId('eqd-run').click();
    await expect(page.getByTestId('eqd-residual-after')).toBeVisible({ timeout: 60_000 });
    await expect(page.getByTestId('eqd-input')).toContainText('model at Row 1 centre');
    const rmsOf = async (testId: string) => Number(/([\d.]+) dB RMS/.exec((await page.getByTestId(testId).textContent()) ?? '')?.[1]);
    const beforeRms = await rmsOf('eqd-residual-before');
    const afterRms = await rmsOf('eqd-residual-after');
    expect(afterRms).toBeLessThanOrEqual(beforeRms);
    const filterRows = page.getByTestId('eqd-filters').locator('tbody tr');
    const n = await filterRows.count();
    expect(n).toBeGreaterThan(0);
    await expect(page.getByTestId('eqd-caution')).toContainText('check the Headroom tab after EQ');
    await page.getByTestId('eqd-apply').click();
    await expect(page.getByText('Applied to every sub output')).toBeVisible();
    for (const sub of demo.subs) await expect(page.getByTestId(`pf-eq-${sub.id}`).locator('fieldset')).toHaveCount(n);
    await expect(subSections).toHaveCount(2 + n);
    await page.getByTestId('eqd-check').click();
    await expect(page.getByTestId('eqd-promised')).toBeVisible({ timeout: 60_000 });
    // Proven by applying it: with the EQ on, against the design's own target, the subs measure what the design promised.
    const check = (await page.getByTestId('eqd-promised').innerText()).replace(/\s+/g, ' ');
    const m = /promised ([\d.]+) dB RMS.*measure ([\d.]+) dB RMS/.exec(check);
    expect(m, check).not.toBeNull();
    expect(Math.abs(Number(m![1]) - Number(m![2]))).toBeLessThanOrEqual(0.05);

    expect(await seriousViolations(page, 'Processor filters', '[role=tabpanel]')).toEqual([]);

    await page.getByTestId('save-button').click();
    await expect(page.getByText('all changes saved')).toBeVisible({ timeout: 60_000 });
    await page.goto(`/systems/${copyId}/sheet`);
    // While the page streams in, React may hold a hidden copy of the sheet in the DOM: read the one on screen.
    await expect(page.getByTestId('sheet-pf-rate').filter({ visible: true })).toHaveText('96000 Hz');
    const sheetRow = page.getByTestId(`sheet-pf-${mainId}-1`).filter({ visible: true });
    for (const value of [hp!.b0, hp!.b1, hp!.b2, hp!.a1, hp!.a2]) await expect(sheetRow).toContainText(String(value));
    await expect(page.getByTestId('sheet-processor-filters').filter({ visible: true })).toContainText('Low-pass, Linkwitz–Riley 4th order (24 dB/oct), 80 Hz');
    await expect(page.locator('[data-testid^="sheet-pf-sub-sub1-"]').filter({ visible: true })).toHaveCount(2 + n); // the applied EQ, on the sheet too
  } finally {
    expect((await page.request.delete(`/api/v1/systems/${copyId}`)).status()).toBe(200);
  }
});

test('Processor filters at 390 and 375 px: the section tables scroll inside their own box, the page does not', async ({ page }) => {
  test.setTimeout(120_000);
  const doc = juniperLaneDocument();
  doc.subs[0]!.eq = [{ kind: 'peaking', centerHz: 42, gainDb: -5, q: 4 }];
  for (const width of [390, 375]) {
    await page.setViewportSize({ width, height: 844 });
    await page.goto(`/systems/new?panel=processor-filters&s=${encodeDocument(doc)}`);
    await expect(page.getByTestId('pf-convention')).toBeVisible({ timeout: 120_000 });
    await expect(page.locator('[data-testid^="pf-output-"]')).toHaveCount(4);
    const widths = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
    expect(widths.scroll, `page ${widths.scroll} px wide in a ${widths.client} px window`).toBeLessThanOrEqual(widths.client);
  }
});
