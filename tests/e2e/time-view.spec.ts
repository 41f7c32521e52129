import { expect, test, type Page } from '@playwright/test';
import { panelReady, seriousViolations } from './helpers/axe';

/**
 * Time views: the Timing tab's "In time" section draws the impulse and step responses of the mains, the sub and the
 * sum with a computed sentence, and follows a recommendation when Timing makes one; a Lesson Step on the time panel
 * renders in the editor's preview and in the Presenter view.
 */

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.waitForLoadState('networkidle');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/, { timeout: 30_000 });
}

test('Timing tab: impulse and step plots, the sentence, and the recommended settings in time', async ({ page }) => {
  test.setTimeout(180_000);
  await page.goto('/systems/new');
  await page.getByRole('tab', { name: 'Timing' }).click();
  // The first visit may compile the panel: give it time before the usual readiness check.
  await expect(page.getByTestId('timing-arrivals').first()).toBeVisible({ timeout: 60_000 });
  await panelReady(page, 'timing-arrivals');
  const section = page.getByTestId('timing-in-time');
  await section.scrollIntoViewIfNeeded();
  await expect(section.getByRole('img', { name: /impulse response$/ })).toBeVisible();
  await expect(section.getByRole('img', { name: /step response$/ })).toBeVisible();
  await expect(section.locator('path[data-trace="sum"]')).toHaveCount(2);
  await expect(section.locator('path[data-trace="mains"]')).toHaveCount(2);
  await expect(section.locator('path[data-trace="sub-0"]')).toHaveCount(2);
  await expect(page.getByTestId('timing-time-sentences')).toContainText(/Sub’s step peaks \d+\.\d ms (after|before) the mains’ \(L\)/);
  expect(await seriousViolations(page, 'timing in time', '[data-testid="timing-in-time"]')).toEqual([]);

  // The whole window, then back to the close-up: the time axis follows.
  await page.getByTestId('timing-time-whole').check();
  await expect(section.getByRole('img', { name: /step response$/ }).locator('desc')).toContainText('from −20');
  await page.getByTestId('timing-time-close-up').check();

  // Tell the processor the sub is 3 m farther than it is: its sound now arrives 8.7 ms early against the mains' delay,
  // Timing recommends a change, and the section can show it (with the present sum dashed beside it).
  const distance = page.getByTestId('timing-sub-0-distance');
  const metres = Number((await distance.inputValue()).replace(',', '.'));
  await distance.fill((metres + 3).toFixed(2));
  await distance.press('Tab');
  await expect(page.getByTestId('timing-time-sentences')).toContainText(/its sound arrives \d+\.\d\d ms before theirs/, { timeout: 30_000 });
  const recommended = page.locator('[data-testid^="timing-time-sub-"], [data-testid="timing-time-group"]').first();
  await expect(recommended).toBeVisible({ timeout: 30_000 });
  const before = await page.getByTestId('timing-time-sentences').textContent();
  await recommended.check();
  await expect(page.getByTestId('timing-time-change')).toContainText(/^Set /);
  await expect(section.locator('path[data-trace="compare"]')).toHaveCount(2);
  await expect(page.getByTestId('timing-time-sentences')).not.toHaveText(before ?? '');
  await page.getByTestId('timing-time-present').check();
  await expect(section.locator('path[data-trace="compare"]')).toHaveCount(0);
});

test('a Lesson Step on the time panel renders in the editor and the Presenter view', async ({ page }) => {
  test.setTimeout(240_000);
  await signIn(page);
  // The demo Lesson's "one metre further" System (the sub 1 m late), as a Step on the time panel with a distance sweep.
  const lessons = await (await page.request.get('/api/v1/lessons')).json();
  const demo = lessons.items.find((l: { title: string }) => l.title === 'Why the sub and mains cancel');
  expect(demo).toBeTruthy();
  const demoLesson = await (await page.request.get(`/api/v1/lessons/${demo.id}`)).json();
  const late = demoLesson.steps.find((s: { title: string }) => s.title.startsWith('One metre further'));
  expect(late).toBeTruthy();
  const created = await page.request.post('/api/v1/lessons', { data: { title: `E2E time view ${Date.now().toString(36)} (invented)` } });
  expect(created.status()).toBe(201);
  const lesson = await created.json();
  try {
    const step = { title: 'The late sub in time', points: '- The sub’s step comes **later**.', panel: 'time', traces: ['mains', 'subs', 'sum'], sweep: { parameter: 'subDistanceM', from: 3, to: 4, durationS: 6 }, document: late.document };
    const added = await page.request.post(`/api/v1/lessons/${lesson.id}/steps`, { data: { step } });
    expect(added.status()).toBe(201);

    await page.goto(`/lessons/${lesson.id}`);
    await expect(page.getByRole('combobox', { name: 'Panel' })).toHaveValue('time', { timeout: 60_000 });
    await expect(page.getByRole('option', { name: 'Impulse and step' })).toHaveCount(1);
    const preview = page.getByTestId('step-time');
    await expect(preview.getByRole('img', { name: /The late sub in time: step response$/ })).toBeVisible();
    // At rest the sweep stands at its start (the sub at 3.0 m, as far as the mains).
    await expect(page.getByTestId('step-time-sentences')).toContainText(/Sub’s step peaks \d+\.\d ms after the mains’ \(L\); its sound arrives at the same time as theirs\./);

    await page.goto(`/lessons/${lesson.id}/present?step=1`);
    const stage = page.getByTestId('presenter-view').filter({ visible: true });
    await expect(stage.getByRole('img', { name: /impulse response$/ })).toBeVisible({ timeout: 60_000 });
    await expect(stage.getByRole('img', { name: /step response$/ })).toBeVisible();
    await expect(stage.getByTestId('sweep-value')).toBeVisible();
    const subPath = () => stage.locator('path[data-trace="sub-0"]').last().getAttribute('d');
    const start = await subPath();
    await page.keyboard.press('Space');
    await expect.poll(subPath, { timeout: 10_000 }).not.toBe(start);
    // By the sweep's end the sub is 1 m farther: 1 m of air at 20 °C is 2.91 ms (Kinsler et al. 2000).
    await expect(stage.getByTestId('step-time-sentences')).toContainText('its sound arrives 2.91 ms after theirs', { timeout: 15_000 });
  } finally {
    expect((await page.request.delete(`/api/v1/lessons/${lesson.id}`)).status()).toBe(200);
  }
});
