import { expect, test, type Page } from '@playwright/test';

// Signed out, on /systems/new (the 5.1 starting System: the invented 6.4 × 4.9 × 2.7 m room).
async function openPanel(page: Page, name: 'Modes' | 'Layout' | 'Headroom') {
  await page.goto('/systems/new');
  await page.getByRole('tab', { name }).click();
}

test('Modes: the mode table and Schroeder frequency; a longer room lowers the first mode', async ({ page }) => {
  await openPanel(page, 'Modes');
  // Published: Schroeder (JASA 1996): V = 84.67 m³, T60 = 0.4 s → 137.5 Hz. Rayleigh: (1,0,0) at c/2L = 26.81 Hz.
  await expect(page.getByTestId('schroeder-hz')).toHaveText('137.5 Hz');
  const table = page.getByTestId('mode-table');
  const firstFrequency = table.locator('tbody tr').first().locator('td').first();
  await expect(firstFrequency).toHaveText('26.81');
  await expect(page.getByTestId('mode-count')).toHaveText('106');

  await page.getByTestId('room-length').fill('8');
  // c / (2 · 8 m) at 20 °C = 21.45 Hz.
  await expect(firstFrequency).toHaveText('21.45');
  await expect(page.getByTestId('schroeder-hz')).not.toHaveText('137.5 Hz');

  // Filter by kind: axial off leaves the (1,1,0) tangential mode first.
  await page.getByRole('checkbox', { name: /axial/ }).uncheck();
  await expect(table.locator('tbody tr').first().locator('td').nth(4)).not.toHaveText('axial');
  // Sort by nH descending: the first row then has the largest height index.
  await page.getByRole('button', { name: /^nH/ }).click();
  await page.getByRole('button', { name: /^nH/ }).click();
  await expect(table.locator('thead th').nth(3)).toHaveAttribute('aria-sort', 'descending');
});

test('Layout: pass/warn per speaker; moving a speaker changes its azimuth', async ({ page }) => {
  await openPanel(page, 'Layout');
  await expect(page.getByTestId('status-SL')).toHaveText(/pass/);
  await expect(page.getByTestId('status-C')).toHaveText(/pass|warn/);
  const azimuth = page.getByTestId('azimuth-L');
  const before = await azimuth.textContent();
  await page.getByRole('button', { name: 'Edit L' }).click();
  await page.getByTestId('speaker-x').fill('0.2');
  await expect(azimuth).not.toHaveText(before ?? '');
  // Geometry: from the MLP (2.45, 3.7) to (0.2, 0.3): atan(2.25 / 3.4) = 33.5°, beyond the 30° limit.
  await expect(azimuth).toHaveText('+33.5°');
  await expect(page.getByTestId('status-L')).toHaveText(/warn/);
  // Metric ↔ feet: the position field follows the units choice.
  await page.getByRole('button', { name: 'Feet / inches' }).click();
  await expect(page.getByTestId('speaker-x')).toHaveValue('0.66');
});

test('Headroom: cautions, max SPL per channel and an amplifier change that moves it', async ({ page }) => {
  await openPanel(page, 'Headroom');
  const cautions = page.getByTestId('headroom-cautions');
  await expect(cautions).toContainText('85 dBA');
  await expect(cautions).toContainText('3 dB exchange rate');
  await expect(cautions).toContainText('licensed professional');
  // The new System drives its 120 W-rated mains with 200 W: the speaker's rating binds (issue 14), so the maximum SPL is
  // the rating's and the amplifier's own figure is shown beside it.
  const maxSpl = page.getByTestId('max-spl-L');
  const detail = page.getByTestId('max-spl-detail-L');
  await expect(page.getByTestId('binding-L')).toContainText('Speaker rating');
  const amplifierOf = async () => Number(/amplifier ([\d.]+)/.exec((await detail.textContent()) ?? '')?.[1]);
  const ratedMax = Number.parseFloat((await maxSpl.textContent()) ?? '');
  const amplifierBefore = await amplifierOf();
  // 200 W over 120 W is 10·log10(200/120) = 2.218 dB (power law, by hand); each figure is shown to 0.1 dB.
  expect(Math.abs(amplifierBefore - ratedMax - 2.218)).toBeLessThanOrEqual(0.11);
  const beforeText = (await detail.textContent()) ?? '';
  await page.getByTestId('power-L').fill('400');
  // Doubling the power adds 10·log10(2) = 3.0 dB to the amplifier's figure (inverse-square law with power, any acoustics
  // text); the maximum SPL stays at the rating.
  await expect(detail).not.toHaveText(beforeText);
  expect((await amplifierOf()) - amplifierBefore).toBeCloseTo(3.0, 0);
  expect(Number.parseFloat((await maxSpl.textContent()) ?? '')).toBe(ratedMax);
  // 60 W is below the rating: the amplifier binds, 10·log10(60/120) = −3.0 dB from the rating's figure.
  await page.getByTestId('power-L').fill('60');
  await expect(page.getByTestId('binding-L')).toContainText('Amplifier');
  expect(Number.parseFloat((await maxSpl.textContent()) ?? '') - ratedMax).toBeCloseTo(-3.0, 0);
});
