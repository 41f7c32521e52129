/**
 * Web hardening (issue 8): a name holding markup is shown as text everywhere it appears — the
 * Library (System name and tag), the shared page, the Settings sheet, a Lesson's title, Step title
 * and talking points (editor, Presenter view, student view) and the workspace name on the Team
 * page. On every page the literal text is visible, no element was made from it, and none of its
 * scripts ran (`window.__pwned` stays undefined).
 */
import { expect, test, type Page } from '@playwright/test';
import { juniperLaneDocument } from '../../lib/demo/systems';

const NAME = '<script>window.__pwned=1</script><img src=x onerror="window.__pwned=2">';
/** Tags hold at most 40 characters. */
const TAG = '<img src=x onerror="window.__pwned=3">';
const PASSWORD = 'script-names-password-1';

async function expectShownAsText(page: Page, where: string, texts: string[]) {
  for (const text of texts) await expect(page.getByText(text, { exact: false }).filter({ visible: true }).first(), `${where}: "${text}" shown as text`).toBeVisible({ timeout: 60_000 });
  // No element was made from the name, and none of its scripts ran.
  expect(await page.locator('img[src="x"]').count(), `${where}: no <img src=x> in the page`).toBe(0);
  expect(await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned), `${where}: window.__pwned`).toBeUndefined();
}

test('a name holding <script> and <img onerror> is shown as text everywhere', async ({ page, browser }) => {
  test.setTimeout(420_000);
  const email = `script-names-${Date.now().toString(36)}@example.test`;
  const signUp = await page.request.post('/api/v1/auth/sign-up', { data: { name: NAME, email, password: PASSWORD } });
  expect(signUp.status()).toBe(201);

  await page.goto('/sign-in', { timeout: 120_000 });
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => u.pathname === '/library', { timeout: 120_000 });

  // Everything is named NAME: the workspace, a System (with the tag), a Lesson with one Step.
  const listed = await page.request.get('/api/v1/workspaces');
  expect(listed.status(), await listed.text()).toBe(200);
  const workspaces = await listed.json();
  const workspaceId: string = workspaces.items[0].id;
  expect((await page.request.patch(`/api/v1/workspaces/${workspaceId}`, { data: { name: NAME } })).status()).toBe(200);
  const doc = { ...juniperLaneDocument(), tags: [TAG] };
  const system = await page.request.post('/api/v1/systems', { data: { name: NAME, document: doc, workspaceId } });
  expect(system.status()).toBe(201);
  const systemId: string = (await system.json()).id;
  const share = await page.request.post(`/api/v1/systems/${systemId}/share-links`);
  expect(share.status()).toBe(201);
  const sharePath = new URL((await share.json()).url).pathname;

  const lesson = await page.request.post('/api/v1/lessons', { data: { title: NAME, description: NAME, workspaceId } });
  expect(lesson.status()).toBe(201);
  const lessonId: string = (await lesson.json()).id;
  const points = `- ${NAME}\n\n${NAME}`;
  const step = await page.request.post(`/api/v1/lessons/${lessonId}/steps`, { data: { step: { title: NAME, points, panel: 'blend', document: juniperLaneDocument() } } });
  expect(step.status()).toBe(201);
  const studentLink = await page.request.post(`/api/v1/lessons/${lessonId}/share-links`);
  expect(studentLink.status()).toBe(201);
  const studentPath = new URL((await studentLink.json()).url).pathname;

  // Library: the System's name and its tag.
  await page.goto('/library', { timeout: 120_000 });
  // Next keeps a just-left copy of a route in the page, hidden (React Activity): look at visible elements only.
  const row = page.getByTestId('library-row').filter({ hasText: NAME, visible: true });
  await expect(row).toHaveCount(1, { timeout: 60_000 });
  await expect(row).toContainText(TAG);
  await expectShownAsText(page, 'Library', [NAME, TAG]);

  // The Settings sheet.
  await page.goto(`/systems/${systemId}/sheet`, { timeout: 120_000 });
  await expect(page.getByRole('heading', { level: 1, name: NAME })).toBeVisible({ timeout: 60_000 });
  await expectShownAsText(page, 'Settings sheet', [NAME]);

  // Team page: the workspace name.
  await page.goto('/team', { timeout: 120_000 });
  await expect(page.getByRole('heading', { level: 1, name: NAME })).toBeVisible({ timeout: 60_000 });
  await expectShownAsText(page, 'Team page', [NAME]);

  // Lesson editor: the Lesson title, the Step title in the list and the field, the points preview.
  await page.goto(`/lessons/${lessonId}`, { timeout: 120_000 });
  await expect(page.getByTestId('step-item-title').first()).toHaveText(NAME, { timeout: 60_000 });
  await page.getByTestId('step-item').filter({ visible: true }).first().click();
  await expect(page.getByTestId('step-title').filter({ visible: true })).toHaveValue(NAME);
  await expect(page.getByTestId('step-points').filter({ visible: true })).toHaveValue(points);
  await expectShownAsText(page, 'Lesson editor', [NAME]);
  expect(await page.getByText(NAME, { exact: false }).count(), 'Lesson editor: the title, the Step and its points').toBeGreaterThanOrEqual(3);

  // Presenter view.
  await page.goto(`/lessons/${lessonId}/present`, { timeout: 120_000 });
  await expect(page.getByTestId('presenter-view').filter({ visible: true })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('presenter-step-title').filter({ visible: true })).toHaveText(NAME);
  await expect(page.getByTestId('presenter-points').filter({ visible: true })).toContainText(NAME);
  await expectShownAsText(page, 'Presenter view', [NAME]);

  // Signed out: the shared System and the student view of the Lesson.
  const visitor = await browser.newContext();
  const anon = await visitor.newPage();
  const shared = await anon.goto(sharePath, { timeout: 120_000 });
  expect(shared?.status()).toBe(200);
  await expect(anon.getByTestId('shared-name')).toHaveText(NAME, { timeout: 60_000 });
  await expectShownAsText(anon, 'Shared page', [NAME]);

  const student = await anon.goto(studentPath, { timeout: 120_000 });
  expect(student?.status()).toBe(200);
  await expect(anon.getByRole('heading', { level: 1, name: NAME })).toBeVisible({ timeout: 60_000 });
  await expect(anon.getByRole('heading', { level: 2 }).filter({ hasText: NAME })).toBeVisible();
  await expectShownAsText(anon, 'Student view', [NAME]);
  expect(await anon.getByText(NAME, { exact: false }).count(), 'Student view: the title, the Step and its points').toBeGreaterThanOrEqual(3);
  await visitor.close();
});
