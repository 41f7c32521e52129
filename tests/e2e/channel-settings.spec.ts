/**
 * Layout on screen shows the channel settings the Settings sheet prints: for both demo Systems (and each with a mains
 * delay, channel offsets, sub delays and gains), every speaker's delay and trim and every sub's delay in the Layout
 * table equal `systemChannelSettings`, with 2 and 1 decimals. (The sheet, CSV and API: tests/data and tests/api
 * channel-settings-agree.)
 */
import { expect, test } from '@playwright/test';
import { editorPath } from '../../lib/client/url-state';
import { systemChannelSettings } from '../../lib/system-model/channel-settings';
import { channelSettingsCases, signedText } from '../helpers/channel-settings';

for (const { label, doc } of channelSettingsCases()) {
  test(`Layout shows the Settings sheet's delays and trims: ${label}`, async ({ page }) => {
    const cs = systemChannelSettings(doc);
    await page.goto(editorPath({ doc, name: `${label} (invented)`, panel: 'blend' }));
    await page.getByRole('tab', { name: 'Layout' }).click();
    const table = page.getByTestId('layout-table');
    await expect(table).toBeVisible({ timeout: 30_000 });
    for (const [i, s] of doc.speakers.entries()) {
      await expect(table.getByTestId(`delay-${s.channel}`)).toHaveText(`${cs.mains[i]!.delayMs.toFixed(2)} ms`);
      await expect(table.getByTestId(`trim-${s.channel}`)).toHaveText(`${signedText(cs.mains[i]!.trimDb, 1)} dB`);
    }
    for (const [j] of doc.subs.entries()) {
      await expect(table.getByTestId(`sub-delay-${j}`)).toHaveText(`${cs.subs[j]!.delayMs.toFixed(2)} ms`);
    }
  });
}
