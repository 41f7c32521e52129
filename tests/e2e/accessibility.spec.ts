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

// The API page is one long page (every route's fields and examples): a third of its route sections per test.
const API_PARTS = 3;
for (let part = 0; part < API_PARTS; part++) {
  test(`axe: no serious or critical violation on /docs/api, part ${part + 1} of ${API_PARTS}`, async ({ page }) => {
    await page.goto('/docs/api');
    const routes = page.locator('[data-testid=api-route]');
    await expect(routes.first()).toBeVisible();
    const ids = await routes.evaluateAll((sections) => sections.map((s) => s.id));
    expect(ids.length).toBeGreaterThan(API_PARTS);
    const others = ids.filter((_, i) => i % API_PARTS !== part).map((id) => `#${id}`);
    expect(await seriousViolations(page, `/docs/api part ${part + 1}`, 'main', others)).toEqual([]);
  });
}
