import { expect, type Page } from '@playwright/test';

/**
 * Signs in as the demo user and opens the invented "Juniper Lane screening room". On a busy server the form can be
 * filled before it hydrates, so it signs in again until the Library shows the System.
 */
export async function openDemoSystem(page: Page): Promise<void> {
  const system = page.getByRole('link', { name: 'Juniper Lane screening room' }).first();
  await expect(async () => {
    await page.goto('/sign-in');
    await page.waitForLoadState('networkidle');
    await page.getByLabel('E-mail').fill('demo@seamline.test');
    await page.getByLabel('Password').fill('seamline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(system).toBeVisible({ timeout: 40_000 });
  }).toPass({ timeout: 150_000 });
  await system.click();
  await expect(page).toHaveURL(/\/systems\/[0-9a-f-]{36}/, { timeout: 60_000 });
}
