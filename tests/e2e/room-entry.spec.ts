import { expect, test, type Page } from '@playwright/test';

// Signed out, on /systems/new: the invented 5.1 starting System (4.9 m wide, 6.4 m long; the MLP at x 2.45, y 3.7 m;
// L at x 0.79, y 0.3 m).
// The pages compile on first visit in a development server: allow for it.
test.describe.configure({ timeout: 120_000 });

async function openLayout(page: Page) {
  await page.goto('/systems/new');
  // A click before the page has hydrated does nothing: click until the tab is selected.
  const tab = page.getByRole('tab', { name: 'Layout' });
  await expect(async () => {
    await tab.click();
    await expect(tab).toHaveAttribute('aria-selected', 'true', { timeout: 2_000 });
  }).toPass({ timeout: 60_000 });
  await expect(page.getByTestId('layout-table')).toBeVisible({ timeout: 30_000 });
}

test('front pair as measured: 123.5 in apart, 122 in from the MLP → 60.8° included, placed, read back', async ({ page }) => {
  await openLayout(page);
  await page.getByRole('button', { name: 'Feet / inches' }).first().click();
  const entry = page.getByTestId('pair-entry');
  await entry.getByTestId('pair-spacing').fill('123.5 in');
  await entry.getByTestId('pair-distance').fill(`10' 2"`);
  // Geometry: 2·asin(61.75 / 122) = 60.82°, shown at once, before anything is placed.
  await expect(entry.getByTestId('pair-included-angle')).toHaveText('60.8°');
  await entry.getByTestId('place-pair').click();
  await expect(entry.getByRole('status')).toContainText('Placed L, R');
  // L and R stand 0.1 m below the ears (1.0 vs 1.1 m), so in the floor plan they are √(3.0988² − 0.1²) = 3.0972 m
  // away: 2·asin(1.5685 / 3.0972) = 60.85° (geometry), which the layout answer measures again from the positions.
  await expect(entry.getByTestId('pair-floor-angle')).toHaveText('60.9°');
  await expect(page.getByTestId('included-angle')).toContainText('60.9°');
  // 122 in = 3.10 m to the processor's 0.01 m = 10′ 2.0″.
  const lRow = page.getByTestId('azimuth-L').locator('xpath=..');
  await expect(lRow).toContainText('10′ 2.0″');
  // Typed text reads back as typed.
  await entry.getByTestId('pair-spacing').blur();
  await expect(entry.getByTestId('pair-spacing')).toHaveValue('123.5 in');
});

test('front pair: impossible input is refused with a message, nothing moves', async ({ page }) => {
  await openLayout(page);
  const entry = page.getByTestId('pair-entry');
  const before = await page.getByTestId('azimuth-L').textContent();
  await entry.getByRole('radio', { name: 'spacing' }).check();
  await entry.getByTestId('pair-spacing').fill('5');
  await entry.getByTestId('pair-distance').fill('2');
  await expect(entry.getByText(/spacing \(5\.00 m\) is more than twice the distance \(2\.00 m\)/)).toBeVisible();
  await expect(entry.getByTestId('place-pair')).toBeDisabled();
  // 4 m at 60°: y = 3.7 − 4·cos 30° = 0.24 m, inside; 5 m: 3.7 − 4.33 = −0.63 m, beyond the front wall (geometry).
  await entry.getByRole('radio', { name: 'included angle' }).check();
  await entry.getByTestId('pair-angle').fill('60');
  await entry.getByTestId('pair-distance').fill('5 m');
  await expect(entry.getByTestId('pair-problems')).toContainText('L would be 0.63 m beyond the front wall');
  await expect(entry.getByTestId('place-pair')).toBeDisabled();
  await expect(page.getByTestId('azimuth-L')).toHaveText(before ?? '');
});

test('a length field takes feet and inches, a decimal comma, and refuses what it cannot read', async ({ page }) => {
  await openLayout(page);
  await page.getByRole('button', { name: 'Feet / inches' }).first().click();
  await page.getByRole('button', { name: 'Edit L' }).click();
  const x = page.getByTestId('speaker-x');
  await x.fill(`3' 4"`);
  // 40 in = 1.016 m; from the MLP (2.45, 3.7) to (1.016, 0.3): atan(1.434 / 3.4) = 22.9° (geometry).
  await expect(page.getByTestId('azimuth-L')).toHaveText('+22.9°');
  await page.getByTestId('speaker-y').fill('0,5 m');
  // y 0.5 m (never 5): atan(1.434 / 3.2) = 24.1°.
  await expect(page.getByTestId('azimuth-L')).toHaveText('+24.1°');
  // Metric and back: the field shows 1.02 m, then what was typed; the stored metres do not drift.
  await page.getByRole('button', { name: 'Metres' }).click();
  await expect(x).toHaveValue('1.02');
  await page.getByRole('button', { name: 'Feet / inches' }).first().click();
  await expect(x).toHaveValue(`3' 4"`);
  await expect(page.getByTestId('azimuth-L')).toHaveText('+24.1°');
  // Unreadable: a message naming the field and how to write a length; the value is unchanged.
  await x.fill('three feet');
  await x.blur();
  await expect(x).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByRole('alert').filter({ hasText: /x — across from the left wall: “three feet” is not a length/ })).toBeVisible();
  await expect(page.getByTestId('azimuth-L')).toHaveText('+24.1°');
});

test.describe('where the locale writes a decimal comma', () => {
  test.use({ locale: 'de-DE' });
  test('numbers are shown with a comma and 80,5 is 80.5', async ({ page }) => {
    await openLayout(page);
    await page.getByRole('button', { name: 'Edit L' }).click();
    await expect(page.getByTestId('speaker-x')).toHaveValue('0,79');
    await page.getByTestId('speaker-x').fill('1,016');
    await expect(page.getByTestId('azimuth-L')).toHaveText('+22.9°');
  });
});

test('a required name is checked as it is typed, not only on Save', async ({ page }) => {
  await page.goto('/systems/new');
  const name = page.getByLabel('System name');
  await expect(async () => {
    await name.fill('');
    await expect(name).toHaveAttribute('aria-invalid', 'true', { timeout: 2_000 });
  }).toPass({ timeout: 60_000 });
  await expect(page.getByRole('alert').filter({ hasText: 'System name is required' })).toBeVisible();
  await name.fill('Den (invented)');
  await expect(name).not.toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('System name is required')).toHaveCount(0);
});
