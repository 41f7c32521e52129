import { expect, test } from '@playwright/test';

/**
 * The shared System page shows every panel of the editor read-only and looking it (settings as values, announced as
 * read-only), with the System's own measurements (never another System's or the rest of the workspace's), and does
 * not scroll sideways on a phone.
 */
test('shared page: every panel, read-only settings, the System’s own measurements, no sideways scroll at 390 px', async ({ page, browser }) => {
  test.setTimeout(240_000);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('demo@seamline.test');
  await page.getByLabel('Password').fill('seamline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/library/, { timeout: 60_000 });
  const systems = await (await page.request.get('/api/v1/systems')).json();
  const juniper = (systems.items ?? systems).find((s: { name: string }) => s.name === 'Juniper Lane screening room') as { id: string; workspaceId: string };
  const own = (await (await page.request.get(`/api/v1/measurements?systemId=${juniper.id}`)).json()).items as { name: string }[];
  const all = (await (await page.request.get(`/api/v1/measurements?workspaceId=${juniper.workspaceId}`)).json()).items as { name: string; systemId: string | null }[];
  const link = await page.request.post(`/api/v1/systems/${juniper.id}/share-links`, { data: {} });
  expect(link.status()).toBe(201);
  const { token, url } = (await link.json()) as { token: string; url: string };

  const visitor = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const anon = await visitor.newPage();
  try {
    expect((await anon.goto(new URL(url).pathname, { waitUntil: 'networkidle' }))?.status()).toBe(200);
    for (const panel of ['blend', 'timing', 'modes', 'layout', 'headroom', 'measured']) {
      await expect(anon.getByTestId(`shared-${panel}`).getByRole('heading', { level: 2 }).first()).toBeVisible({ timeout: 60_000 });
      await expect(anon.getByTestId(`shared-${panel}`).locator('svg').first()).toBeVisible({ timeout: 60_000 });
    }
    // A setting reads as read-only: disabled, aria-readonly, and no box (a transparent border).
    const crossover = anon.getByTestId('shared-blend').getByLabel(/Crossover frequency/).first();
    await expect(crossover).toBeDisabled();
    await expect(crossover).toHaveAttribute('aria-readonly', 'true');
    expect(await crossover.evaluate((e) => getComputedStyle(e).borderTopColor)).toBe('rgba(0, 0, 0, 0)');
    // No greyed action buttons (Re-apply, Apply to System…) on the read-only page.
    expect(await anon.locator('[data-testid^=shared-] button:disabled:visible').count()).toBe(0);

    // Measured: the System's own measurements and only those.
    const list = anon.getByTestId('shared-measured').getByTestId('measurement-list');
    await expect(list.locator('li')).toHaveCount(Math.min(own.length, 12));
    for (const other of all.filter((m) => m.systemId !== juniper.id)) await expect(list.getByText(other.name, { exact: true })).toHaveCount(0);
    if (own.length) await expect(anon.getByTestId('shared-measured-note')).toContainText(`uploaded for this System (${Math.min(own.length, 12)}`);

    await anon.setViewportSize({ width: 390, height: 844 });
    await anon.waitForTimeout(500);
    const [scrollWidth, clientWidth] = await anon.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
    expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
  } finally {
    await visitor.close();
    await page.request.delete(`/api/v1/share-links/${token}`);
  }
});
