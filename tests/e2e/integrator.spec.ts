import { expect, test } from '@playwright/test';

// The integrator's story (issue 4): the demo owner opens the invented "Juniper Lane screening room",
// moves the crossover on Blend, runs the Crossover sweep and applies its top row, then moves a sub on
// Timing and sees the recommendation follow. Nothing is saved, so the demo data stays as seeded.
test('Blend → Crossover sweep → Timing on the Juniper Lane screening room', async ({ page }) => {
  test.setTimeout(180_000);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/library/, { timeout: 60_000 });

  await page.getByRole('link', { name: 'Juniper Lane screening room' }).first().click();
  await page.waitForURL(/\/systems\/[^/]+/, { timeout: 60_000 });
  await expect(page.getByRole('tab', { name: 'Blend' })).toHaveAttribute('aria-selected', 'true');

  // Blend: 80 → 100 Hz changes the read-outs.
  const crossover = page.getByTestId('crossover-hz');
  await expect(crossover).toHaveValue('80', { timeout: 30_000 });
  const sum = page.getByTestId('readout-sum-level');
  const phase = page.getByTestId('readout-phase-difference');
  const mains = page.getByTestId('readout-mains-level');
  await expect(sum).toHaveText(/dB/, { timeout: 60_000 });
  await expect(page.getByText(/^Mains at 80\.0\s?Hz$/)).toBeVisible();
  const before = { sum: await sum.textContent(), phase: await phase.textContent(), mains: await mains.textContent() };
  await crossover.fill('100');
  await expect(page.getByText(/^Mains at 100\s?Hz$/)).toBeVisible({ timeout: 30_000 });
  await expect.poll(async () => [await sum.textContent(), await phase.textContent(), await mains.textContent()].join('|'), { timeout: 30_000 }).not.toBe([before.sum, before.phase, before.mains].join('|'));

  // Crossover sweep: run it (progress shown), then apply the top row.
  await page.getByTestId('sweep-run').click();
  await expect(page.getByRole('progressbar', { name: 'Crossover sweep progress' })).toBeVisible();
  await expect(page.getByTestId('sweep-run')).toHaveText(/Run the sweep/, { timeout: 120_000 });
  const top = page.getByTestId('sweep-row-1');
  await expect(top).toBeVisible();
  const topHz = ((await top.locator('td').nth(1).textContent()) ?? '').replace(/[^\d.]/g, '');
  expect(Number(topHz)).toBeGreaterThanOrEqual(40);
  expect(Number(topHz)).toBeLessThanOrEqual(150);
  await page.getByTestId('sweep-apply-1').click();
  await expect(page.getByText(/Applied to the System:/)).toBeVisible();
  await expect(crossover).toHaveValue(String(Number(topHz)));

  // Timing: moving a sub's distance moves the recommendation.
  await page.getByRole('tab', { name: 'Timing' }).click();
  const recommendation = page.getByTestId('timing-recommendation-0');
  await expect(recommendation).toBeVisible({ timeout: 60_000 });
  const phaseCell = page.getByTestId('timing-phase-0');
  const firstText = `${await recommendation.textContent()}|${await phaseCell.textContent()}`;
  const distance = page.getByTestId('timing-sub-0-distance');
  const metres = Number(await distance.inputValue());
  await distance.fill(String(Math.round((metres + 1.3) * 100) / 100));
  await expect.poll(async () => `${await recommendation.textContent()}|${await phaseCell.textContent()}`, { timeout: 30_000 }).not.toBe(firstText);
  await expect(page.getByText(/measured; positions give/)).toBeVisible();
  await expect(page.getByRole('img', { name: /Level at the crossover against delay/ })).toBeVisible();
});
