import { expect, test } from '@playwright/test';
import { panelReady, seriousViolations } from './helpers/axe';

// One test per page and per editor panel, so a slow scan on a busy machine never adds up past a test's timeout.
// Each waits for the panel's own ready signal (its first answer drawn, nothing busy), never a fixed sleep.

const PANELS = [
  { name: 'Blend', ready: 'readout-sum-level' },
  { name: 'Timing', ready: 'timing-arrivals' },
  { name: 'Modes', ready: 'mode-table' },
  { name: 'Layout', ready: 'status-L' },
  { name: 'Headroom', ready: 'max-spl-L' },
  { name: 'Measured', ready: 'measured-panel' },
] as const;

for (const { name, ready } of PANELS) {
  test(`axe: no serious or critical violation on the ${name} panel`, async ({ page }) => {
    await page.goto('/systems/new');
    await page.getByRole('tab', { name }).click();
    await expect(page.getByRole('tab', { name })).toHaveAttribute('aria-selected', 'true');
    await panelReady(page, ready);
    expect(await seriousViolations(page, name, '[role=tabpanel]')).toEqual([]);
  });
}

for (const path of ['/', '/sign-in', '/docs/api']) {
  test(`axe: no serious or critical violation on ${path}`, async ({ page }) => {
    await page.goto(path);
    await expect(page.locator('main')).toBeVisible();
    expect(await seriousViolations(page, path)).toEqual([]);
  });
}
