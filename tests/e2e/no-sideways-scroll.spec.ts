/**
 * Phones (issue 14): no page scrolls sideways at 375 px. One browser context walks every page under app/ in turn —
 * the public pages signed out, then every signed-in page (Library and its tabs, a revision, the editor with every
 * panel for a new and a saved System, the Settings sheet, Lessons, the Lesson editor, the Presenter view, Team, Account, the
 * admin page, which answers "not found" to a member) and the shared System and shared Lesson pages — and checks
 * `scrollWidth ≤ clientWidth` once each page's own ready signal is there (never a fixed sleep). A failure names the
 * page and the elements reaching furthest past the right edge, their own box or the text spilling out of it (those
 * that really widen the page: an element a scroll box or a clipping box holds is left out).
 */
import { expect, test, type Page } from '@playwright/test';
import { PANELS } from './helpers/panels';
import { juniperLaneDocument } from '../../lib/demo/systems';

const WIDTH = 375;

/** Null when the page is no wider than the screen; else the widths and the elements that stick out furthest. */
function sidewaysOverflow(page: Page): Promise<string | null> {
  return page.evaluate(() => {
    const root = document.documentElement;
    const clientWidth = root.clientWidth;
    if (root.scrollWidth <= clientWidth) return null;
    // Does a box between the element and the page clip it (overflow other than visible)? An absolutely positioned
    // element escapes every box up to its containing block, a fixed one every box (it never widens the page).
    const clipped = (el: Element): boolean => {
      let position = getComputedStyle(el).position;
      for (let a = el.parentElement; a && a !== root; a = a.parentElement) {
        const style = getComputedStyle(a);
        const containing = position === 'absolute' ? style.position !== 'static' || style.transform !== 'none' : position === 'fixed' ? style.transform !== 'none' : true;
        if (!containing) continue;
        if (a !== document.body && style.overflowX !== 'visible') return true;
        position = style.position;
      }
      return position === 'fixed';
    };
    const describe = (el: Element) => {
      const testId = el.getAttribute('data-testid');
      const cls = typeof el.className === 'string' ? el.className : (el.getAttribute('class') ?? '');
      const text = (el.textContent ?? '').trim().replace(/\s+/g, ' ').slice(0, 40);
      return `<${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''}${testId ? ` data-testid="${testId}"` : ''}${cls ? ` class="${cls.slice(0, 80)}"` : ''}>${text ? ` "${text}"` : ''}`;
    };
    // How far right an element reaches: its box, or the text and boxes spilling out of it when it lets them (a long
    // word or path in a heading spills out of a box that is itself narrow enough).
    const reach = (el: Element) => {
      const box = el.getBoundingClientRect();
      return getComputedStyle(el).overflowX === 'visible' ? Math.max(box.right, box.left + el.scrollWidth) : box.right;
    };
    const wide = [...document.body.querySelectorAll('*')]
      .map((el) => ({ el, right: reach(el) }))
      .filter(({ el, right }) => right > clientWidth + 0.5 && !clipped(el))
      .sort((a, b) => b.right - a.right)
      .slice(0, 5)
      .map(({ el, right }) => `  reaches ${Math.round(right)} px: ${describe(el)}`);
    return [`scrollWidth ${root.scrollWidth} px > clientWidth ${clientWidth} px`, ...wide].join('\n');
  });
}

/** Opens `path`, waits for its ready signal and nothing busy in main, and checks that it does not scroll sideways. */
async function check(page: Page, label: string, ready: () => Promise<void>) {
  // A development server may reload a page it has just compiled: then wait for the page again and measure anew.
  for (let attempt = 1; ; attempt++) {
    await ready();
    await expect(page.locator('main [aria-busy=true]')).toHaveCount(0, { timeout: 60_000 });
    try {
      expect.soft(await sidewaysOverflow(page), `${label} (${page.url()}) scrolls sideways at ${WIDTH} px`).toBeNull();
      return;
    } catch (e) {
      if (attempt >= 3 || !/context was destroyed|navigat/i.test(String(e))) throw e;
      await page.waitForLoadState('load');
    }
  }
}

async function visit(page: Page, path: string, label: string, ready: (page: Page) => Promise<void> = mainHeading) {
  await page.goto(path, { timeout: 120_000 });
  await check(page, label, () => ready(page));
}

const mainHeading = async (page: Page) => {
  await expect(page.locator('h1').filter({ visible: true }).first()).toBeVisible({ timeout: 120_000 });
};
const testId = (id: string) => async (page: Page) => {
  await expect(page.getByTestId(id).filter({ visible: true }).first()).toBeVisible({ timeout: 120_000 });
};

async function everyPanel(page: Page, where: string) {
  for (const { name, ready } of PANELS) {
    await page.getByRole('tab', { name }).click();
    await expect(page.getByRole('tab', { name })).toHaveAttribute('aria-selected', 'true');
    await check(page, `${where}, ${name} panel`, async () => {
      await expect(page.getByRole('tabpanel').getByTestId(ready).first()).toBeVisible({ timeout: 120_000 });
      await expect(page.locator('[role=tabpanel] [aria-busy=true]')).toHaveCount(0, { timeout: 60_000 });
    });
  }
}

test.use({ viewport: { width: WIDTH, height: 812 } });

test(`no page scrolls sideways at ${WIDTH} px`, async ({ page }) => {
  test.setTimeout(900_000);

  // Signed out.
  await visit(page, '/', 'Landing page');
  await visit(page, '/docs/api', 'API page');
  const apiParts = await page
    .getByRole('navigation', { name: 'Routes' })
    .locator('h2 a')
    .evaluateAll((links) => links.map((a) => a.getAttribute('href') ?? ''));
  expect(apiParts.length).toBeGreaterThan(5);
  for (const part of apiParts) await visit(page, part, `API page ${part}`, testId('api-route'));
  await visit(page, '/sign-up', 'Sign-up');
  await visit(page, '/forgot', 'Forgotten password');
  await visit(page, '/reset/not-a-real-token', 'Reset password (unknown link)');
  await visit(page, '/invite/not-a-real-token', 'Invitation (unknown link)');
  await visit(page, '/sign-in', 'Sign-in', async (p) => expect(p.getByLabel('E-mail')).toBeVisible({ timeout: 120_000 }));
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => u.pathname === '/library', { timeout: 120_000 });

  // A saved System with a share link, and a Lesson (one Step with the phase plot and a sweep) with a student link.
  const workspaces = await page.request.get('/api/v1/workspaces');
  expect(workspaces.status(), await workspaces.text()).toBe(200);
  const workspaceId: string = (await workspaces.json()).items[0].id;
  const system = await page.request.post('/api/v1/systems', { data: { name: 'Narrow screen check (invented)', document: juniperLaneDocument(), workspaceId } });
  expect(system.status(), await system.text()).toBe(201);
  const systemId: string = (await system.json()).id;
  const share = await page.request.post(`/api/v1/systems/${systemId}/share-links`);
  expect(share.status(), await share.text()).toBe(201);
  const sharePath = new URL((await share.json()).url).pathname;
  const lesson = await page.request.post('/api/v1/lessons', { data: { title: 'Narrow screen check (invented)', description: 'Every page on a phone', workspaceId } });
  expect(lesson.status(), await lesson.text()).toBe(201);
  const lessonId: string = (await lesson.json()).id;
  const steps = [
    { title: 'A Step with a long title that must be cut short on a phone rather than widen the page', points: '- One point\n- Another', panel: 'blend', document: juniperLaneDocument() },
    { title: 'Phase and a sweep', points: 'Watch the phase.', panel: 'timing', traces: ['mains', 'subs', 'sum', 'target', 'phase'], sweep: { parameter: 'subDistanceM', from: 3, to: 4, durationS: 4 }, document: juniperLaneDocument() },
  ];
  for (const step of steps) {
    const added = await page.request.post(`/api/v1/lessons/${lessonId}/steps`, { data: { step } });
    expect(added.status(), await added.text()).toBe(201);
  }
  const studentLink = await page.request.post(`/api/v1/lessons/${lessonId}/share-links`);
  expect(studentLink.status(), await studentLink.text()).toBe(201);
  const studentPath = new URL((await studentLink.json()).url).pathname;

  // Signed in.
  await visit(page, '/library', 'Library, Systems', testId('library-row'));
  await visit(page, '/library?view=deleted', 'Library, Recently deleted');
  await visit(page, '/library?view=profiles', 'Library, Speaker profiles', testId('profile-row'));
  await visit(page, `/library/${systemId}`, 'History', testId('revision-row'));
  await visit(page, `/library/${systemId}/revisions/1`, 'A revision');
  await visit(page, '/systems/new', 'New System', async (p) => expect(p.getByLabel('System name')).toBeVisible({ timeout: 120_000 }));
  await everyPanel(page, 'New System');
  await visit(page, `/systems/${systemId}`, 'Saved System', async (p) => expect(p.getByLabel('System name')).toBeVisible({ timeout: 120_000 }));
  await everyPanel(page, 'Saved System');
  await visit(page, `/systems/${systemId}/sheet`, 'Settings sheet', testId('sheet-schroeder'));
  await visit(page, '/lessons', 'Lessons', testId('lesson-list'));
  await visit(page, `/lessons/${lessonId}`, 'Lesson editor', testId('step-plot'));
  await visit(page, `/lessons/${lessonId}/present?step=1`, 'Presenter view, Step 1', testId('step-plot'));
  await visit(page, `/lessons/${lessonId}/present?step=2`, 'Presenter view, Step 2 (phase, sweep)', testId('step-plot'));
  await visit(page, '/team', 'Team');
  await visit(page, '/account', 'Account', async (p) => expect(p.getByRole('button', { name: 'Make token' })).toBeVisible({ timeout: 120_000 }));
  await visit(page, '/admin/users', 'Admin users (not found for a member)');
  await visit(page, '/dev/mailbox', 'Dev mailbox');
  await visit(page, sharePath, 'Shared System', testId('shared-name'));
  await visit(page, studentPath, 'Shared Lesson', testId('student-step-counter'));

  // Tidy up: the Lesson and the System go (the System to Recently deleted).
  expect((await page.request.delete(`/api/v1/lessons/${lessonId}`)).status()).toBe(200);
  expect((await page.request.delete(`/api/v1/systems/${systemId}`)).status()).toBe(200);
});
