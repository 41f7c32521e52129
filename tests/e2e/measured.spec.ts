import { expect, test } from '@playwright/test';
import { demoMeasurementFiles } from '../../scripts/demo-measurements';

// The invented Juniper Lane files (scripts/demo-measurements.ts), uploaded under unique names.
const files = demoMeasurementFiles(7);
const mainsFile = files.find((f) => f.role === 'mains' && f.hasPhase)!;
const subFile = files.find((f) => f.role === 'sub' && f.hasPhase)!;

test('Measured: upload a mains and a sub file, preview, save, predict, move the sub delay; a broken file lists its line errors', async ({ page }) => {
  test.setTimeout(180_000);
  const tag = Date.now().toString(36);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/, { timeout: 60_000 });
  await page.getByRole('link', { name: 'Juniper Lane screening room' }).first().click();
  await expect(page).toHaveURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 60_000 });
  await page.getByRole('tab', { name: 'Measured' }).click();
  const panel = page.getByTestId('measured-panel');
  await expect(panel).toBeVisible({ timeout: 60_000 });

  const created: string[] = [];
  page.on('response', async (res) => {
    if (res.url().endsWith('/api/v1/measurements') && res.request().method() === 'POST' && res.status() === 201) created.push((await res.json()).id);
  });

  for (const [file, name] of [[mainsFile, `E2E mains ${tag}`], [subFile, `E2E sub ${tag}`]] as const) {
    await page.getByTestId('measurement-file-input').setInputFiles({ name: file.fileName, mimeType: 'text/csv', buffer: Buffer.from(file.text) });
    const preview = page.getByTestId('measurement-preview');
    await expect(preview).toBeVisible();
    await expect(preview.getByTestId('preview-point-count')).toHaveText(String(file.text.trim().split('\n').length - 4));
    await expect(preview.getByRole('img', { name: /Preview of the file/ })).toBeVisible();
    await preview.getByLabel('Name').fill(name);
    await preview.getByLabel('What was playing').selectOption(file.role);
    await preview.getByRole('button', { name: 'Save to the Library' }).click();
    await expect(panel.getByText(`Saved "${name}"`)).toBeVisible();
    await expect(page.getByTestId('measurement-list').getByText(name)).toBeVisible();
  }

  await page.getByTestId('pick-mains').selectOption({ label: `E2E mains ${tag}` });
  await page.getByTestId('pick-sub').selectOption({ label: `E2E sub ${tag}` });
  const level = page.getByTestId('predicted-at-crossover');
  await expect(level).toContainText('dB');
  await expect(page.getByTestId('measured-timing-window')).toContainText('ms');
  const before = await level.textContent();
  await page.getByTestId('measured-sub-delay').fill('6');
  await expect(level).not.toHaveText(before ?? '');
  const after = await level.textContent();
  expect(after).not.toBe(before);

  const broken = ['# invented broken file', 'Hz,dB,deg', '20,-3,0', '25,-3,0', '31.5,oops,0', '40,-3,0', '40,-3,0', '63,-3,0', '80,-3,0', '100,-3,0'].join('\n');
  await page.getByTestId('measurement-file-input').setInputFiles({ name: 'broken.csv', mimeType: 'text/csv', buffer: Buffer.from(broken) });
  const errors = page.getByTestId('measurement-errors');
  await expect(errors).toBeVisible();
  await expect(errors).toContainText('line 5, column 2');
  await expect(errors).toContainText('"oops" is not a number');
  await expect(errors).toContainText('line 7, column 1');
  await expect(errors).toContainText('Nothing was saved');

  for (const id of created) expect((await page.request.delete(`/api/v1/measurements/${id}`)).status()).toBe(200);
  expect(created).toHaveLength(2);
});
