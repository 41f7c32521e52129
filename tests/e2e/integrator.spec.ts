import { expect, test, type Locator, type Page } from '@playwright/test';

// The integrator's story (issues 4 and 12): the demo owner opens the invented "Juniper Lane screening room", moves
// the crossover on Blend, runs the Crossover sweep and follows its top row, then follows every piece of Timing
// advice — and after each, the blend is at least as flat and as deep as before (the rule every piece of advice keeps).
// Nothing is saved, so the demo data stays as seeded.

/** "±0.79 dB" → 0.79; "24.3 Hz" → 24.3; "below 5 Hz" → 5. */
const number = (text: string | null): number => (/below/.test(text ?? '') ? 5 : Number((text ?? '').replace(/[^\d.]/g, '')));

async function blendReading(page: Page): Promise<{ flatnessDb: number; minus3Hz: number }> {
  await page.getByRole('tab', { name: 'Blend' }).click();
  const flatness = page.getByTestId('readout-max-deviation');
  await expect(flatness).toHaveText(/±\d/, { timeout: 60_000 });
  await expect(page.locator('[role=tabpanel] [aria-busy=true]')).toHaveCount(0, { timeout: 60_000 });
  return { flatnessDb: number(await flatness.textContent()), minus3Hz: number(await page.getByTestId('readout-minus3').textContent()) };
}

function expectNotWorse(before: { flatnessDb: number; minus3Hz: number }, after: { flatnessDb: number; minus3Hz: number }, what: string) {
  // Read-outs are rounded to 0.01 dB and 0.1 Hz.
  expect(after.flatnessDb, `${what}: flatness ${before.flatnessDb} → ${after.flatnessDb} dB`).toBeLessThanOrEqual(before.flatnessDb + 0.01);
  expect(Math.log2(after.minus3Hz / before.minus3Hz), `${what}: −3 dB point ${before.minus3Hz} → ${after.minus3Hz} Hz`).toBeLessThanOrEqual(1 / 3 + 0.01);
}

/** Timing's present flatness read-out once the panel has answered. */
async function timingFlatness(page: Page, card: Locator): Promise<number> {
  await expect(card).toBeVisible({ timeout: 60_000 });
  await expect(page.locator('[role=tabpanel] [aria-busy=true]')).toHaveCount(0, { timeout: 60_000 });
  return number(((await page.getByTestId('timing-present').textContent()) ?? '').match(/±[\d.]+/)?.[0] ?? null);
}

test('Blend → Crossover sweep → Timing on the Juniper Lane screening room: every piece of advice, followed, leaves the blend as flat and as deep', async ({ page }) => {
  test.setTimeout(240_000);
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
  await expect(sum).toHaveText(/dB/, { timeout: 60_000 });
  await expect(page.getByText(/^Mains at 80\.0\s?Hz$/)).toBeVisible();
  const at80 = await blendReading(page);
  await crossover.fill('100');
  await expect(page.getByText(/^Mains at 100\s?Hz$/)).toBeVisible({ timeout: 30_000 });
  await expect.poll(async () => (await blendReading(page)).flatnessDb, { timeout: 30_000 }).not.toBe(at80.flatnessDb);
  await crossover.fill('80');
  await expect(page.getByText(/^Mains at 80\.0\s?Hz$/)).toBeVisible({ timeout: 30_000 });

  // Crossover sweep: run it (progress shown); follow the top row unless it is the present setting.
  const beforeSweep = await blendReading(page);
  await page.getByTestId('sweep-run').click();
  await expect(page.getByRole('progressbar', { name: 'Crossover sweep progress' })).toBeVisible();
  await expect(page.getByTestId('sweep-run')).toHaveText(/Run the sweep/, { timeout: 120_000 });
  const top = page.getByTestId('sweep-row-1');
  await expect(top).toBeVisible();
  const topHz = number(await top.locator('td').nth(1).textContent());
  if (await page.getByTestId('sweep-apply-1').count()) {
    await page.getByTestId('sweep-apply-1').click();
    await expect(page.getByText(/Applied to the System:/)).toBeVisible();
    await expect(crossover).toHaveValue(String(topHz));
    expectNotWorse(beforeSweep, await blendReading(page), `sweep top row ${topHz} Hz`);
  } else {
    await expect(page.getByTestId('sweep-notes-1')).toHaveText(/present setting/);
  }

  // Timing: follow every card that advises a change (each leaves the blend no worse), then the all-subs card.
  await page.getByRole('tab', { name: 'Timing' }).click();
  const first = page.getByTestId('timing-advice-0');
  for (const id of ['timing-advice-0', 'timing-advice-1', 'timing-group']) {
    const card = page.getByTestId(id);
    await timingFlatness(page, first);
    if ((await card.getByTestId(`${id}-apply`).count()) === 0) {
      await expect(card.getByTestId(`${id}-text`)).toHaveText('Keep the present setting');
      await expect(card.getByTestId(`${id}-reason`)).toHaveText(/0\.5 dB|third of an octave/);
      continue;
    }
    const before = await blendReading(page);
    await page.getByRole('tab', { name: 'Timing' }).click();
    await card.getByTestId(`${id}-apply`).click();
    await expect(page.getByText(/Applied to the System:/)).toBeVisible();
    expectNotWorse(before, await blendReading(page), id);
    await page.getByRole('tab', { name: 'Timing' }).click();
  }

  // A sub's distance set 1.3 m wrong on the processor: the blend suffers, Timing advises, and following it recovers.
  const distance = page.getByTestId('timing-sub-0-distance');
  const metres = Number(await distance.inputValue());
  await distance.fill(String(Math.round((metres + 1.3) * 100) / 100));
  await expect(page.getByText(/measured; the positions give/)).toBeVisible();
  await expect(first.getByTestId('timing-advice-0-apply')).toBeVisible({ timeout: 60_000 });
  const wrong = await blendReading(page);
  await page.getByRole('tab', { name: 'Timing' }).click();
  await first.getByTestId('timing-advice-0-apply').click();
  const fixed = await blendReading(page);
  expectNotWorse(wrong, fixed, 'advice after a wrong distance');
  expect(fixed.flatnessDb).toBeLessThan(wrong.flatnessDb - 0.4);
  await page.getByRole('tab', { name: 'Timing' }).click();
  await expect(page.getByRole('img', { name: /Flatness against delay/ })).toBeVisible();
});
