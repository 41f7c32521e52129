import { expect, test } from '@playwright/test';

test('without an account: edits on three panels live in the URL and reopen the same in a fresh browser', async ({ page, browser }) => {
  await page.goto('/systems/new');
  await page.getByLabel('System name').fill('Garage cinema (invented)');

  // Blend: crossover 80 → 110 Hz.
  await page.getByRole('tab', { name: 'Blend' }).click();
  const crossover = page.getByRole('spinbutton', { name: /Crossover frequency/ });
  await crossover.fill('110');

  // Modes: a 7.2 m long room.
  await page.getByRole('tab', { name: 'Modes' }).click();
  await page.getByTestId('room-length').fill('7.2');
  await expect(page.getByTestId('mode-table').locator('tbody tr').first().locator('td').first()).toHaveText('23.83'); // 343.21 / (2 · 7.2), Rayleigh

  // Layout: move the front left speaker.
  await page.getByRole('tab', { name: 'Layout' }).click();
  const before = await page.getByTestId('azimuth-L').textContent();
  await page.getByRole('button', { name: 'Edit L' }).click();
  await page.getByTestId('speaker-x').fill('0.4');
  await expect(page.getByTestId('azimuth-L')).not.toHaveText(before ?? '');
  const azimuthAfter = await page.getByTestId('azimuth-L').textContent();

  await expect.poll(() => new URL(page.url()).searchParams.get('s')?.length ?? 0).toBeGreaterThan(100);
  await page.waitForTimeout(400); // the URL follows edits after 150 ms
  const link = page.url();

  const fresh = await browser.newContext();
  const other = await fresh.newPage();
  await other.goto(link);
  await expect(other.getByLabel('System name')).toHaveValue('Garage cinema (invented)');
  await expect(other.getByTestId('azimuth-L')).toHaveText(azimuthAfter ?? '');
  await other.getByRole('tab', { name: 'Modes' }).click();
  await expect(other.getByTestId('room-length')).toHaveValue('7.2');
  await other.getByRole('tab', { name: 'Blend' }).click();
  await expect(other.getByRole('spinbutton', { name: /Crossover frequency/ })).toHaveValue('110');
  await fresh.close();
});

test('a damaged link opens a fresh System and says why', async ({ page }) => {
  await page.goto('/systems/new?s=not-a-real-document');
  await expect(page.getByText(/The link (is damaged|holds a System that is not valid)/)).toBeVisible();
  await expect(page.getByRole('tab', { name: 'Blend' })).toBeVisible();
});
