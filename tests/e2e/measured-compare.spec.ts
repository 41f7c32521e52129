import { expect, test, type Page } from '@playwright/test';
import { demoMeasurementFiles } from '../../scripts/demo-measurements';
import { seriousViolations } from './helpers/axe';

// The invented demo (scripts/demo-measurements.ts): the C speaker measured at "Row 1 centre (MLP)" with its invented
// Placement switch at "Free-standing" and at "Near a wall" (a −3 dB low shelf at 150 Hz).
const SEAT = 'Row 1 centre (MLP)';
const FLAT = 'Placement: Free-standing';
const WALL = 'Placement: Near a wall';

/** A list route's items; asked again while a development server answers otherwise (it may be recompiling). */
async function listed<T>(page: Page, url: string): Promise<T[]> {
  let items: T[] | null = null;
  await expect
    .poll(async () => {
      const res = await page.request.get(url);
      if (res.status() === 200) items = (await res.json()).items as T[];
      return res.status();
    }, { timeout: 60_000 })
    .toBe(200);
  return items!;
}

async function openMeasured(page: Page) {
  await page.goto('/sign-in');
  // A click before the page has hydrated submits nothing useful on a busy development server: try again until signed in.
  await expect(async () => {
    if (new URL(page.url()).pathname !== '/sign-in') await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('demo@seamline.test');
    await page.getByLabel('Password').fill('seamline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => url.pathname === '/library', { timeout: 15_000 });
  }).toPass({ timeout: 90_000 });
  // Straight to the demo System (the Library may hold many Systems made by other tests).
  const larkspur = (await listed<{ id: string; name: string }>(page, '/api/v1/workspaces')).find((w) => w.name === 'Larkspur AV')!;
  const juniper = (await listed<{ id: string; name: string }>(page, `/api/v1/systems?workspaceId=${larkspur.id}`)).find((x) => x.name === 'Juniper Lane screening room')!;
  await page.goto(`/systems/${juniper.id}`);
  await expect(page).toHaveURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 60_000 });
  await openMeasuredTab(page);
}

/** Clicks the Measured tab until it is selected (a click before hydration is lost) and its table is drawn. */
async function openMeasuredTab(page: Page) {
  const tab = page.getByRole('tab', { name: 'Measured' });
  await expect(async () => {
    await tab.click();
    await expect(tab).toHaveAttribute('aria-selected', 'true', { timeout: 5_000 });
  }).toPass({ timeout: 60_000 });
  await expect(page.getByTestId('measurement-table')).toBeVisible({ timeout: 60_000 });
}

test('Measured runs: the table shows the demo runs and a gap; Compare shows the Placement switch’s shelf as the API answers it', async ({ page }) => {
  test.setTimeout(180_000);
  const posted: unknown[] = [];
  page.on('request', (r) => {
    if (r.url().endsWith('/api/v1/measured/compare') && r.method() === 'POST') posted.push(JSON.parse(r.postData() ?? 'null'));
  });
  await openMeasured(page);
  const table = page.getByTestId('measurement-table');

  // Filled cells: both switch runs under C at the MLP, the subs at every seat; a gap: C at Row 1 left.
  const centre = table.getByTestId(`run-cell-${SEAT}-C`);
  await expect(centre.getByText(FLAT)).toBeVisible({ timeout: 30_000 });
  await expect(centre.getByText(WALL)).toBeVisible();
  await expect(centre.getByText('text', { exact: true })).toHaveCount(2);
  for (const seat of ['Row 1 left', SEAT, 'Row 1 right']) await expect(table.getByTestId(`run-cell-${seat}-Sub front left`).getByTestId('run-entry')).not.toHaveCount(0);
  await expect(table.getByTestId('run-cell-Row 1 left-C')).toHaveText('not measured');

  // Compare: reference "Free-standing", the other "Near a wall", no smoothing choice changed (1/6 octave), levels as measured.
  const compare = page.getByTestId('run-compare');
  const reference = compare.getByTestId('compare-reference');
  const flatValue = await reference.locator('option', { hasText: FLAT }).getAttribute('value');
  await reference.selectOption(flatValue!);
  const others = compare.getByTestId('compare-others');
  for (const box of await others.getByRole('checkbox', { checked: true }).all()) await box.uncheck();
  await others.getByRole('checkbox', { name: new RegExp(WALL) }).check();
  await compare.getByTestId('compare-smoothing').selectOption('6');
  await expect(compare.getByTestId('compare-levels-note')).toContainText('Levels as measured');

  // The request the page sent for what it shows (the ids of the two runs, named by their run labels).
  const systemId = page.url().match(/\/systems\/([0-9a-f-]{36})/)![1];
  const runs = await listed<{ id: string; runLabel: string }>(page, `/api/v1/measurements?systemId=${systemId}&seat=${encodeURIComponent(SEAT)}&role=C`);
  const id = (label: string) => runs.find((r) => r.runLabel === label)!.id;
  const sent = { reference: { name: FLAT, measurementId: id(FLAT) }, others: [{ name: WALL, measurementId: id(WALL) }], smoothingFraction: 6 };
  await expect.poll(() => posted.some((b) => JSON.stringify(b) === JSON.stringify(sent)), { timeout: 30_000 }).toBe(true);

  await expect(compare.getByRole('img', { name: 'Runs as differences from the reference' })).toBeVisible();
  const readout = compare.getByTestId('compare-readout');
  await expect(readout).toHaveCount(1);

  // The same request to the API, from this signed-in page: the number on screen is its answer, to 2 decimals.
  const api = await page.request.post('/api/v1/measured/compare', { data: sent });
  expect(api.status()).toBe(200);
  const body = await api.json();
  const largest = body.differences[0].largest;
  const shown = Number((await readout.getByTestId('compare-largest-db').textContent())!.replace('\u2212', '-').replace(/[^0-9.+-]/g, ''));
  expect(shown).toBeCloseTo(largest.differenceDb, 2);
  // The switch's shelf (invented profile: a −3 dB low shelf at 150 Hz): the wall position is about 3 dB down in the
  // low bass and the same as the flat one from 1 kHz up, on average over the seeded noise of the invented files.
  expect(largest.differenceDb).toBeLessThan(-2.4);
  expect(largest.differenceDb).toBeGreaterThan(-4);
  expect(largest.frequencyHz).toBeLessThan(150);
  const f: number[] = body.frequencyHz;
  const d: number[] = body.differences[0].differenceDb;
  const mean = (keep: (hz: number) => boolean) => {
    const v = d.filter((_x, i) => keep(f[i]!));
    return v.reduce((a, b) => a + b, 0) / v.length;
  };
  const lowBassDb = mean((hz) => hz <= 40);
  expect(lowBassDb).toBeGreaterThan(-3.5);
  expect(lowBassDb).toBeLessThan(-2.5);
  expect(Math.abs(mean((hz) => hz >= 1000))).toBeLessThan(0.2);

  // Match levels over the band shown: the note and the request say so.
  await compare.getByTestId('compare-match-levels').check();
  await expect(compare.getByTestId('compare-levels-note')).toContainText('Levels matched');
  await expect(compare.getByTestId('compare-levels-note')).toContainText('dB');

  // The in-room extension of the mains: the three points and the crossover judged in words.
  const extension = page.getByTestId('extension-panel');
  await expect(extension.getByTestId('extension-points')).toContainText('Hz');
  await expect(extension.getByTestId('extension-verdict')).toContainText(/crossover at 80 Hz/i);
  await expect(extension.getByTestId('extension-rule')).toContainText('power average over 200 Hz–2 kHz');
  // The default is the mains measured at most seats, as the seats' spatial average (the L mains at all three).
  await expect(extension.getByTestId('extension-curve')).toHaveValue('average');
  await expect(extension.getByTestId('extension-rule')).toContainText('newest run at each of 3 seats');

  // A run relabelled in place: one uploaded here at a seat the System does not have, then removed.
  const tag = Date.now().toString(36);
  const file = demoMeasurementFiles(7).find((x) => x.role === 'C')!;
  const upload = await page.request.post('/api/v1/measurements', {
    multipart: { file: { name: file.fileName, mimeType: 'text/csv', buffer: Buffer.from(file.text) }, name: `E2E run ${tag} (invented)`, systemId: systemId!, seat: `E2E seat ${tag}`, role: 'C' },
  });
  expect(upload.status()).toBe(201);
  const uploaded = (await upload.json()).id as string;
  try {
    // Uploaded behind the page's back: open the tab again to list it.
    await page.reload();
    await openMeasuredTab(page);
    const cell = table.getByTestId(`run-cell-E2E seat ${tag}-C`);
    await expect(cell.getByText('no run label')).toBeVisible({ timeout: 30_000 });
    await cell.getByRole('button', { name: `Edit the labels of E2E run ${tag} (invented)` }).click();
    await cell.getByLabel('Run label').fill('after moving the sub');
    await cell.getByRole('button', { name: 'Save labels' }).click();
    await expect(cell.getByText('after moving the sub')).toBeVisible();
    const stored = await (await page.request.get(`/api/v1/measurements/${uploaded}`)).json();
    expect(stored.runLabel).toBe('after moving the sub');
  } finally {
    expect((await page.request.delete(`/api/v1/measurements/${uploaded}`)).status()).toBe(200);
  }

  expect(await seriousViolations(page, 'Measured runs', '[data-testid="measured-runs"]')).toEqual([]);
});

test('Measured runs at 390 px: the table scrolls in its own box, the page does not scroll sideways', async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 390, height: 844 });
  await openMeasured(page);
  await expect(page.getByTestId('measurement-table').getByTestId('run-entry').first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('run-compare').getByTestId('compare-readout').first()).toBeVisible({ timeout: 30_000 });
  const widths = await page.evaluate(() => ({ page: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  expect(widths.page).toBeLessThanOrEqual(widths.client);
  const box = page.getByRole('region', { name: /Seats and sources table/ });
  expect(await box.evaluate((el) => el.scrollWidth > el.clientWidth)).toBe(true);
});
