import { expect, test } from '@playwright/test';
import { panelReady, seriousViolations } from './helpers/axe';
import { PANELS } from './helpers/panels';

// One test per page and per editor panel, so a slow scan on a busy machine never adds up past a test's timeout.
// Each waits for the panel's own ready signal (its first answer drawn, nothing busy), never a fixed sleep.
// An axe scan is pure CPU in the page: on a shared 2-core machine at load 20+ a scan that takes 8 s alone took 66 s,
// so these tests get twice the suite's 60 s; npm test still lists any that take over a third of it.
test.describe.configure({ timeout: 120_000 });

// Modes draws a mode table of every mode below 200 Hz, a mode map and seat plots with thousands of SVG elements:
// its text and controls, its mode table and its plots are scanned apart.
const PARTS: { label: string; include: string; exclude: string[] }[] = [
  { label: 'text and controls', include: '[role=tabpanel]', exclude: ['[role=tabpanel] svg', '[data-testid=mode-table]'] },
  { label: 'mode table', include: '[data-testid=mode-table]', exclude: [] },
  { label: 'plots', include: '[role=tabpanel] svg', exclude: [] },
];

for (const { name, ready } of PANELS) {
  for (const part of name === 'Modes' ? PARTS : [{ label: '', include: '[role=tabpanel]', exclude: [] }]) {
    test(`axe: no serious or critical violation on the ${name} panel${part.label ? `, ${part.label}` : ''}`, async ({ page }) => {
      await page.goto('/systems/new');
      await page.getByRole('tab', { name }).click();
      await expect(page.getByRole('tab', { name })).toHaveAttribute('aria-selected', 'true');
      await panelReady(page, ready);
      expect(await seriousViolations(page, name, part.include, part.exclude)).toEqual([]);
    });
  }
}

for (const path of ['/', '/sign-in']) {
  test(`axe: no serious or critical violation on ${path}`, async ({ page }) => {
    await page.goto(path);
    await expect(page.locator('main')).toBeVisible();
    expect(await seriousViolations(page, path)).toEqual([]);
  });
}

// The API page: an overview, and one part per tag of the OpenAPI document (a test below checks this list against the
// overview's links, in the document's order, so a new tag cannot go unscanned). The Compute part is long: half of its sections per test.
const API_PARTS: [slug: string, slices: number][] = [
  ['compute', 2],
  ['measured', 1],
  ['library', 1],
  ['lessons', 1],
  ['profiles', 1],
  ['measurements', 1],
  ['workspaces', 1],
  ['account', 1],
  ['openapi', 1],
];

test('axe: no serious or critical violation on the /docs/api overview; its parts are the ones scanned here', async ({ page }) => {
  await page.goto('/docs/api');
  const parts = page.getByRole('navigation', { name: 'Routes' }).locator('h2 a');
  await expect(parts.first()).toBeVisible();
  const hrefs = await parts.evaluateAll((links) => links.map((a) => a.getAttribute('href')));
  expect(hrefs).toEqual(API_PARTS.map(([slug]) => `/docs/api/${slug}`));
  expect(await seriousViolations(page, '/docs/api')).toEqual([]);
});

for (const [slug, slices] of API_PARTS) {
  for (let slice = 0; slice < slices; slice++) {
    test(`axe: no serious or critical violation on /docs/api/${slug}${slices > 1 ? `, part ${slice + 1} of ${slices}` : ''}`, async ({ page }) => {
      await page.goto(`/docs/api/${slug}`);
      const sections = page.locator('[data-testid=api-route]');
      await expect(sections.first()).toBeVisible();
      const ids = await sections.evaluateAll((all) => all.map((s) => s.id));
      const others = slices > 1 ? ids.filter((_, i) => i % slices !== slice).map((id) => `#${id}`) : [];
      expect(await seriousViolations(page, `/docs/api/${slug}`, 'main', others)).toEqual([]);
    });
  }
}
