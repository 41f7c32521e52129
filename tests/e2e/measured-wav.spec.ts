import { expect, test, type Page } from '@playwright/test';
import { impulseCase, impulseFixture, sosImpulse } from '../dsp/measured/impulse-fixture';
import { wavBytes } from '../helpers/wav-bytes';
import { seriousViolations } from './helpers/axe';
import { openDemoSystem } from './helpers/demo-system';

// An invented room impulse response, written by the test: the sealed-box high-pass of the scipy fixture (2nd order,
// 50 Hz, Q 0.707, through the bilinear transform at 48 kHz; scripts/reference/impulse-fixtures.py) arriving 30 ms
// after the file's first sample, plus one reflection 6 ms later at 0.4 of its level; 1 s long, 24-bit, peak at half scale.
const SAMPLE_RATE_HZ = impulseFixture.sampleRateHz;
const ARRIVAL_SAMPLES = 1440; // 30 ms at 48 kHz
const REFLECTION_SAMPLES = 288; // 6 ms at 48 kHz

function roomImpulseWav(): Buffer {
  const sealed = impulseCase('sealed-highpass-50-q0707');
  const direct = sosImpulse(sealed.sos, ARRIVAL_SAMPLES, SAMPLE_RATE_HZ);
  const reflection = sosImpulse(sealed.sos, ARRIVAL_SAMPLES + REFLECTION_SAMPLES, SAMPLE_RATE_HZ);
  const samples = direct.map((x, i) => 0.5 * (x + 0.4 * (reflection[i] as number)));
  return Buffer.from(wavBytes({ sampleRateHz: SAMPLE_RATE_HZ, format: 'int24', channels: [samples] }));
}

async function openMeasured(page: Page) {
  await openDemoSystem(page);
  await page.getByRole('tab', { name: 'Measured' }).click();
  await expect(page.getByTestId('measured-panel')).toBeVisible({ timeout: 60_000 });
}

/** The number a window field shows (ms). */
const fieldMs = async (page: Page, testId: string) => Number((await page.getByTestId(testId).inputValue()).replace(',', '.'));

test('Measured: a WAV impulse response is windowed on its plot (fields and drag), previewed, saved with its window and run label', async ({ page }) => {
  test.setTimeout(300_000);
  const tag = Date.now().toString(36);
  await openMeasured(page);
  const created: string[] = [];
  page.on('response', async (res) => {
    if (res.url().endsWith('/api/v1/measurements') && res.request().method() === 'POST' && res.status() === 201) created.push((await res.json()).id);
  });

  await page.getByTestId('measurement-file-input').setInputFiles({ name: `room-impulse-${tag}.wav`, mimeType: 'audio/wav', buffer: roomImpulseWav() });
  const wav = page.getByTestId('wav-preview');
  await expect(wav).toBeVisible();
  await expect(wav.getByRole('img', { name: /Impulse response of room-impulse/ })).toBeVisible();
  // The peak was placed at sample 1440 (30 ms, hand-worked); the reader refines it within a sample (1/48 ms).
  const arrival = Number((await wav.getByTestId('wav-arrival').textContent())?.replace(/[^\d.]/g, ''));
  expect(Math.abs(arrival - 30)).toBeLessThan(1000 / SAMPLE_RATE_HZ);
  // The default window: 20 ms before the peak, 500 ms long (dsp/measured/impulse-window.ts).
  await expect(wav.getByTestId('window-default-note')).toContainText('20 ms before the peak, 500 ms long');
  expect(await fieldMs(page, 'window-start')).toBeCloseTo(10, 2);
  expect(await fieldMs(page, 'window-length')).toBeCloseTo(500, 2);
  await expect(wav.getByTestId('window-meaning')).toContainText('resolves down to about 2 Hz');
  // Every control of the editor is labelled (axe, serious and critical rules).
  expect(await seriousViolations(page, 'WAV window editor', '[data-testid="wav-preview"]')).toEqual([]);

  const trace = wav.getByTestId('windowed-preview').locator('[data-trace="window"]');
  await expect(trace).toHaveAttribute('d', /^M/);
  const before = await trace.getAttribute('d');

  // By the fields: 25 ms to 35 ms leaves out the reflection at 36 ms.
  await wav.getByLabel('Window start').fill('25');
  await wav.getByLabel('Window length').fill('10');
  await expect(wav.getByTestId('window-meaning')).toContainText('resolves down to about 100 Hz');
  await expect(wav.getByTestId('window-short-warning')).toBeVisible();
  await expect(trace).not.toHaveAttribute('d', before ?? '');
  await expect(wav.getByTestId('windowed-preview')).toHaveAttribute('aria-busy', 'false');
  const shortWindow = await trace.getAttribute('d');

  // By a drag: the end edge to the right (the view holds still while dragging), then the start edge to the left.
  const end = wav.locator('[data-edge="end"] rect').first();
  const box = (await end.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2 + 25, box.y + box.height / 2, { steps: 5 });
  await page.mouse.up();
  await expect.poll(() => fieldMs(page, 'window-length')).toBeGreaterThan(10);
  const start = wav.locator('[data-edge="start"] rect').first();
  const startBox = (await start.boundingBox())!;
  await page.mouse.move(startBox.x + startBox.width / 2, startBox.y + startBox.height / 2);
  await page.mouse.down();
  await page.mouse.move(startBox.x + startBox.width / 2 - 20, startBox.y + startBox.height / 2, { steps: 5 });
  await page.mouse.up();
  await expect.poll(() => fieldMs(page, 'window-start')).toBeLessThan(25);
  await expect(trace).not.toHaveAttribute('d', shortWindow ?? '');

  // Back to the default, then a window of our own to save.
  await wav.getByRole('button', { name: 'Default window', exact: true }).click();
  await expect.poll(() => fieldMs(page, 'window-start')).toBeCloseTo(10, 2);
  await expect.poll(() => fieldMs(page, 'window-length')).toBeCloseTo(500, 2);
  await wav.getByLabel('Window length').fill('300');

  const name = `E2E impulse ${tag}`;
  const runLabel = `near-wall switch on ${tag}`;
  await wav.getByLabel('Name').fill(name);
  await wav.getByLabel('Run label').fill(runLabel);
  await wav.getByRole('button', { name: 'Save to the Library' }).click();
  const saved = page.getByTestId('measurement-saved-note');
  await expect(saved).toContainText(`Saved "${name}" (${runLabel})`, { timeout: 30_000 });
  await expect(saved).toContainText(/The peak arrives 30\.0\d ms after the file's first sample/);
  await expect(saved).toContainText('Window: 10.00–310.00 ms');
  const row = page.getByTestId('measurement-list').locator('li', { hasText: name });
  await expect(row).toBeVisible({ timeout: 30_000 });
  await expect(row.getByTestId('run-label-tag')).toHaveText(runLabel);
  await expect(row).toContainText('from an impulse response');

  for (const id of created) expect((await page.request.delete(`/api/v1/measurements/${id}`)).status()).toBe(200);
  expect(created).toHaveLength(1);
});

test('Measured: a clipped WAV is refused with advice to record again lower; a broken one names what is wrong', async ({ page }) => {
  test.setTimeout(240_000);
  await openMeasured(page);
  const clipped = Array.from({ length: 4800 }, (_, i) => (i === 100 ? 1.5 : i === 101 ? -0.3 : 0));
  await page.getByTestId('measurement-file-input').setInputFiles({ name: 'clipped.wav', mimeType: 'audio/wav', buffer: Buffer.from(wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [clipped] })) });
  const errors = page.getByTestId('measurement-errors');
  await expect(errors).toContainText('clipped.wav: The recording is clipped');
  await expect(errors).toContainText('Record it again with the level lower');
  await expect(page.getByTestId('wav-preview')).toHaveCount(0);

  const truncated = wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [[0, 0.5, 0.2, 0]] }).subarray(0, 30);
  await page.getByTestId('measurement-file-input').setInputFiles({ name: 'truncated.wav', mimeType: 'audio/wav', buffer: Buffer.from(truncated) });
  await expect(errors).toContainText('truncated.wav: The WAV file was refused');
  await expect(errors).toContainText('Nothing was saved');
});
