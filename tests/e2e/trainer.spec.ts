import { expect, test, type Page } from '@playwright/test';

/**
 * A trainer's journey: build a three-step Lesson from the System editor with "Add to lesson",
 * reorder and give a Step a sweep, present it with the keyboard, watch the sweep move the plot,
 * then open the student link signed out and take a Step into the editor.
 */
const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const lessonTitle = `E2E summation ${unique} (invented)`;
const lessonTitleRe = new RegExp(lessonTitle.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.waitForLoadState('networkidle');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/, { timeout: 30_000 });
}

async function addFromEditor(page: Page, stepName: string, tab: string | null, first: boolean) {
  await page.goto('/systems/new');
  await page.waitForLoadState('networkidle');
  const name = page.getByLabel('System name');
  await expect(name).toBeVisible();
  await name.fill(stepName);
  if (tab) await page.getByRole('tab', { name: tab }).click();
  await page.getByTestId('add-to-lesson').click();
  const dialog = page.getByRole('dialog', { name: 'Add this System to a Lesson' });
  await expect(dialog).toBeVisible();
  await expect(dialog.getByLabel('Step title')).toHaveValue(stepName);
  if (first) {
    await dialog.getByLabel('A new Lesson').check();
    await dialog.getByLabel('New Lesson title').fill(lessonTitle);
  } else {
    await dialog.getByRole('radio', { name: lessonTitleRe }).check();
  }
  await dialog.getByRole('button', { name: 'Add Step' }).click();
  await expect(dialog.getByTestId('added-to-lesson')).toContainText(`of “${lessonTitle}”`);
  return dialog;
}

const sumPath = (page: Page) => page.locator('[data-testid="step-plot"] path[data-trace="sum"]').first().getAttribute('d');

test('build a Lesson from the editor, present it, share it with a student', async ({ page, browser }) => {
  test.setTimeout(240_000);
  await signIn(page);

  await addFromEditor(page, 'Step one: the starting room', null, true);
  await addFromEditor(page, 'Step two: on the Timing panel', 'Timing', false);
  const dialog = await addFromEditor(page, 'Step three: the crossover', 'Layout', false);
  await expect(dialog.getByTestId('added-to-lesson')).toContainText('Added as Step 3');
  await dialog.getByRole('link', { name: 'Open the Lesson' }).click();

  await expect(page).toHaveURL(/\/lessons\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  const items = page.getByTestId('step-item-title');
  await expect(items).toHaveText(['Step one: the starting room', 'Step two: on the Timing panel', 'Step three: the crossover']);

  // Reorder by keyboard: Alt+↑ on the third Step moves it to second, and focus stays on it.
  await page.getByRole('button', { name: /Step three: the crossover/ }).first().focus();
  await page.keyboard.press('Alt+ArrowUp');
  await expect(items).toHaveText(['Step one: the starting room', 'Step three: the crossover', 'Step two: on the Timing panel']);
  // …and back with the Move down button.
  await page.getByRole('button', { name: 'Move "Step three: the crossover" down' }).click();
  await expect(items).toHaveText(['Step one: the starting room', 'Step two: on the Timing panel', 'Step three: the crossover']);

  // Give Step three a crossover sweep (60 → 120 Hz) and talking points.
  await page.getByRole('button', { name: /Step three: the crossover/ }).first().click();
  await expect(page.getByTestId('step-title')).toHaveValue('Step three: the crossover');
  await page.getByTestId('step-points').fill('- Watch the **dip** move\n- <script>not markup</script>');
  await page.getByTestId('sweep-parameter').selectOption('crossoverHz');
  await page.getByTestId('save-step').click();
  await expect(page.getByText('Step saved.')).toBeVisible();
  await expect(page.getByText('<script>not markup</script>').first()).toBeVisible();

  // Present: → twice with the keyboard, the URL follows, the counter reads 3 / 3.
  await page.getByRole('link', { name: 'Present' }).click();
  // Next can keep a hidden copy of a just-left route in the page (React Activity): look at visible elements.
  await expect(page.getByTestId('presenter-view').filter({ visible: true })).toBeVisible({ timeout: 60_000 });
  await expect(page).toHaveURL(/step=\d/);
  await page.keyboard.press('Home');
  await expect(page.getByTestId('step-counter').filter({ visible: true })).toHaveText('1 / 3');
  await page.keyboard.press('ArrowRight');
  await expect(page.getByTestId('step-counter').filter({ visible: true })).toHaveText('2 / 3');
  await expect(page).toHaveURL(/step=2/);
  await page.keyboard.press('ArrowRight');
  await expect(page.getByTestId('step-counter').filter({ visible: true })).toHaveText('3 / 3');
  await expect(page).toHaveURL(/step=3/);
  await expect(page.getByTestId('presenter-step-title').filter({ visible: true })).toHaveText('Step three: the crossover');
  await expect(page.getByTestId('presenter-points').filter({ visible: true })).toContainText('Watch the dip move');

  // Space plays the sweep: the sum's path and the swept value change over time.
  await expect(page.getByTestId('sweep-value').filter({ visible: true })).toHaveText(/crossover 60\s?Hz/);
  const before = await sumPath(page);
  await page.keyboard.press('Space');
  await page.waitForTimeout(1500);
  const during = await sumPath(page);
  const valueDuring = await page.getByTestId('sweep-value').filter({ visible: true }).first().textContent();
  await page.waitForTimeout(1200);
  const later = await sumPath(page);
  expect(before).toBeTruthy();
  expect(during).not.toBe(before);
  expect(later).not.toBe(during);
  expect(valueDuring).not.toMatch(/crossover 60\s?Hz/);
  // Space pauses: the plot holds still.
  await page.keyboard.press('Space');
  const paused = await sumPath(page);
  await page.waitForTimeout(600);
  expect(await sumPath(page)).toBe(paused);
  // R restarts from 60 Hz and plays.
  await page.keyboard.press('r');
  await page.waitForTimeout(800);
  expect(await page.getByTestId('sweep-value').filter({ visible: true }).first().textContent()).toMatch(/crossover (6\d|7\d)/);
  // P hides the presenter's talking points.
  await page.keyboard.press('p');
  await expect(page.getByTestId('presenter-points').filter({ visible: true })).toHaveCount(0);
  // A URL per step: ?step=2 opens Step two.
  const url = new URL(page.url());
  url.searchParams.set('step', '2');
  await page.goto(url.toString());
  await expect(page.getByTestId('step-counter').filter({ visible: true })).toHaveText('2 / 3');

  // The student link, opened signed out in a fresh browser context.
  await page.getByRole('link', { name: lessonTitleRe }).click();
  await page.getByRole('button', { name: 'Create a student link' }).click();
  const studentUrl = await page.getByTestId('student-link').first().inputValue();
  expect(studentUrl).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/);

  const student = await browser.newContext();
  const s = await student.newPage();
  await s.goto(new URL(studentUrl).pathname);
  await expect(s.getByRole('heading', { name: lessonTitle })).toBeVisible({ timeout: 60_000 });
  await expect(s.getByTestId('student-step-counter')).toHaveText('Step 1 of 3');
  await s.getByRole('button', { name: 'Next →' }).click();
  await expect(s.getByTestId('student-step-counter')).toHaveText('Step 2 of 3');
  await s.getByRole('link', { name: 'Open this step in the editor' }).click();
  await expect(s).toHaveURL(/\/systems\/new\?s=[^&]+.*panel=timing/, { timeout: 60_000 });
  await expect(s.getByRole('tab', { name: 'Timing' })).toHaveAttribute('aria-selected', 'true');
  await expect(s.getByRole('link', { name: 'Sign in to save' })).toBeVisible();
  await student.close();
});
