/**
 * One set of channel settings everywhere: for both demo Systems (and each with every extra setting non-zero), the
 * Settings sheet, its printed component, its CSV export read back, the Layout answer (computeLayout on the request
 * the editor sends, and the route handler of POST /api/v1/layout) all carry exactly `systemChannelSettings`' numbers —
 * number by number, with the decimals they were rounded to. (Over HTTP: tests/api/channel-settings-agree.test.ts.)
 */
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/layout/route';
import { SettingsSheet } from '@/components/sheet/settings-sheet';
import { systemChannelSettings } from '@/lib/system-model/channel-settings';
import { computeLayout, layoutRequestFromDocument } from '@/lib/system-model/layout';
import { computeSettingsSheet, settingsSheetCsv } from '@/lib/system-model/settings-sheet';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';
import { cellText, channelSettingsCases, csvRecords, signedText } from '../helpers/channel-settings';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

const CASES = channelSettingsCases();

async function layoutOverRoute(body: unknown): Promise<Json> {
  const res = await POST(new Request('http://x/api/v1/layout', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) }), undefined as never);
  expect(res.status).toBe(200);
  return res.json();
}

describe('channel settings: Layout, the Settings sheet, its CSV and the API agree number by number', () => {
  it('the tester’s Juniper Lane figures: L 3.78 m / 0.92 ms, C 2.01 ms / −0.9 dB, SL 5.29 ms / −4.4 dB, subs 4.10 m / 0 ms and 2.46 m / 4.77 ms', () => {
    const cs = systemChannelSettings(CASES[0]!.doc);
    const doc = CASES[0]!.doc;
    const by = (ch: string) => cs.mains[doc.speakers.findIndex((s) => s.channel === ch)]!;
    expect(by('L')).toEqual({ distanceM: 3.78, delayMs: 0.92, trimDb: 0 });
    expect(by('C')).toEqual({ distanceM: 3.41, delayMs: 2.01, trimDb: -0.9 });
    expect(by('SL')).toEqual({ distanceM: 2.29, delayMs: 5.29, trimDb: -4.4 });
    // By hand: the right-wall sub (4.6, 2.8, 0.3) is √(2.15² + 0.9² + 0.8²) = 2.464 m from the MLP (2.45, 3.7, 1.1),
    // the corner sub 4.1015 m; aligned to the farther, (4.1015 − 2.4643) m / 343.2 m/s = 4.77 ms.
    expect(cs.subs).toEqual([
      { distanceM: 4.1, delayMs: 0, gainDb: 0 },
      { distanceM: 2.46, delayMs: 4.77, gainDb: 0 },
    ]);
  });

  for (const { label, doc } of CASES) {
    describe(label, () => {
      const cs = systemChannelSettings(doc);

      it('computeSettingsSheet carries systemChannelSettings', () => {
        const sheet = computeSettingsSheet(doc);
        expect(sheet.channels.map((c) => ({ distanceM: c.distanceM, delayMs: c.delayMs, trimDb: c.trimDb }))).toEqual(cs.mains);
        expect(sheet.subs.map((s) => ({ distanceM: s.distanceM, delayMs: s.delayMs, gainDb: s.gainDb }))).toEqual(cs.subs);
        expect(sheet.channels.map((c) => c.offsetDb)).toEqual(doc.speakers.map((s) => s.trimDb));
        expect(sheet.subs.map((s) => s.ownDelayMs)).toEqual(doc.subs.map((s) => s.delayMs));
      });

      it('the CSV export, read back, carries the same numbers written with 2 / 2 / 1 decimals', () => {
        const records = csvRecords(settingsSheetCsv(`${label} (invented)`, 3, doc));
        const channels = records.filter((r) => r.kind === 'channel');
        const subs = records.filter((r) => r.kind === 'sub');
        expect(channels.map((r) => r.id)).toEqual(doc.speakers.map((s) => s.id));
        expect(subs.map((r) => r.id)).toEqual(doc.subs.map((s) => s.id));
        channels.forEach((r, i) => {
          const m = cs.mains[i]!;
          expect([Number(r.distanceM), Number(r.delayMs), Number(r.trimDb)], r.label).toEqual([m.distanceM, m.delayMs, m.trimDb]);
          expect([r.distanceM, r.delayMs, r.trimDb]).toEqual([m.distanceM.toFixed(2), m.delayMs.toFixed(2), m.trimDb.toFixed(1)]);
        });
        subs.forEach((r, j) => {
          const s = cs.subs[j]!;
          expect([Number(r.distanceM), Number(r.delayMs), Number(r.gainDb)], r.label).toEqual([s.distanceM, s.delayMs, s.gainDb]);
          expect([r.distanceM, r.delayMs, r.gainDb]).toEqual([s.distanceM.toFixed(2), s.delayMs.toFixed(2), s.gainDb.toFixed(1)]);
        });
      });

      it('the printed Settings sheet shows them with the decimals they were rounded to', () => {
        const html = renderToStaticMarkup(createElement(SettingsSheet, { name: label, revision: 1, savedAt: '2025-01-01T00:00:00.000Z', document: doc }));
        doc.speakers.forEach((s, i) => {
          const m = cs.mains[i]!;
          expect(cellText(html, `sheet-distance-${s.channel}`)).toBe(`${m.distanceM.toFixed(2)} m`);
          expect(cellText(html, `sheet-delay-${s.channel}`)).toBe(`${m.delayMs.toFixed(2)} ms`);
          expect(cellText(html, `sheet-trim-${s.channel}`)).toBe(`${signedText(m.trimDb, 1)} dB`);
        });
        doc.subs.forEach((s, j) => {
          const x = cs.subs[j]!;
          expect(cellText(html, `sheet-sub-distance-${s.id}`)).toBe(`${x.distanceM.toFixed(2)} m`);
          expect(cellText(html, `sheet-sub-delay-${s.id}`)).toBe(`${x.delayMs.toFixed(2)} ms`);
          expect(cellText(html, `sheet-sub-gain-${s.id}`)).toBe(`${signedText(x.gainDb, 1)} dB`);
        });
        expect(html).toContain('distance alignment plus the mains delay');
        expect(html).toContain('distance alignment plus the sub’s own delay');
        expect(html).toContain('level match by distance plus the channel’s offset');
      });

      it('Layout (computeLayout on the editor’s request, and the route handler) answers the same distances, delays, trims and gains', async () => {
        const request = layoutRequestFromDocument(doc)!;
        expect(request.mainsDelayMs).toBe(doc.bassManagement.mainsDelayMs);
        for (const answer of [computeLayout(layoutRequestSchema.parse(request)), await layoutOverRoute(request)]) {
          expect(answer.speakers.map((s: Json) => ({ distanceM: s.distanceM, delayMs: s.delayMs, trimDb: s.trimDb }))).toEqual(cs.mains);
          expect(answer.subs.map((s: Json) => ({ distanceM: s.distanceM, delayMs: s.delayMs, gainDb: s.gainDb }))).toEqual(cs.subs);
          const all = [...cs.mains, ...cs.subs];
          expect(answer.farthest.distanceM).toBe(all[cs.farthestIndex]!.distanceM);
        }
      });

      it('the sub-to-mains timing the client receives is the one Layout shows', () => {
        const sheet = computeSettingsSheet(doc);
        const layout = computeLayout(layoutRequestSchema.parse(layoutRequestFromDocument(doc)));
        for (let i = 0; i < sheet.channels.length; i++) {
          for (let j = 0; j < sheet.subs.length; j++) {
            expect(Math.round((sheet.subs[j]!.delayMs - sheet.channels[i]!.delayMs) * 100)).toBe(Math.round((layout.subs[j]!.delayMs - layout.speakers[i]!.delayMs) * 100));
          }
        }
        expect(Math.min(...sheet.channels.map((c) => c.delayMs), ...sheet.subs.map((s) => s.delayMs))).toBe(0);
      });
    });
  }
});
