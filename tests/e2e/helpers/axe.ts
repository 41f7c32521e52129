import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';

/**
 * Serious and critical axe violations inside `include` (default `main`), as readable lines; an empty list passes.
 * Scanning only the page's own content keeps axe quick on a busy machine.
 */
export async function seriousViolations(page: Page, label: string, include = 'main', exclude: readonly string[] = []): Promise<string[]> {
  let builder = new AxeBuilder({ page }).include(include);
  for (const selector of exclude) builder = builder.exclude(selector);
  const results = await builder.analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${label}: ${v.id} — ${v.help} (${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')})`);
}

/** Waits until a panel has drawn its first answer: its own element is visible and nothing inside is still busy. */
export async function panelReady(page: Page, readyTestId: string): Promise<void> {
  await expect(page.getByRole('tabpanel').getByTestId(readyTestId).first()).toBeVisible();
  await expect(page.locator('[role=tabpanel] [aria-busy=true]')).toHaveCount(0);
}
