/**
 * One set of channel settings over HTTP against the running app: for both demo Systems (and each with every extra
 * setting non-zero), POST /api/v1/layout with the editor's request, the saved System's CSV export, its Settings sheet
 * page and its shared page all carry exactly `systemChannelSettings`' numbers. (In-process twin:
 * tests/data/channel-settings-agree.test.ts.)
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { systemChannelSettings } from '@/lib/system-model/channel-settings';
import { layoutRequestFromDocument } from '@/lib/system-model/layout';
import { cellText, channelSettingsCases, csvRecords, signedText } from '../helpers/channel-settings';
import { Client } from '../helpers/http';
import { makeTeam, type Team, createTeamSystem as createSystem } from '../helpers/team';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

const CASES = channelSettingsCases();

describe('channel settings over HTTP: POST /api/v1/layout with the editor’s request answers systemChannelSettings', () => {
  for (const { label, doc } of CASES) {
    it(label, async () => {
      const cs = systemChannelSettings(doc);
      const res = await new Client().post('/api/v1/layout', layoutRequestFromDocument(doc));
      expect(res.status, res.text).toBe(200);
      expect(res.body.speakers.map((s: Json) => ({ distanceM: s.distanceM, delayMs: s.delayMs, trimDb: s.trimDb }))).toEqual(cs.mains);
      expect(res.body.subs.map((s: Json) => ({ distanceM: s.distanceM, delayMs: s.delayMs, gainDb: s.gainDb }))).toEqual(cs.subs);
    });
  }
});

describe('channel settings over HTTP: a saved System’s CSV export, Settings sheet page and shared page agree', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('settings');
  }, 120_000);

  for (const { label, doc } of CASES) {
    it(`${label}: the saved System's CSV, Settings sheet page and shared page carry the same numbers`, async () => {
      const cs = systemChannelSettings(doc);
      const system = await createSystem(team, `${label} (invented)`, doc);

      const csv = await team.clients.viewer.get(`/api/v1/systems/${system.id}/export?format=csv`);
      expect(csv.status).toBe(200);
      const records = csvRecords(csv.text);
      const channels = records.filter((r) => r.kind === 'channel');
      const subs = records.filter((r) => r.kind === 'sub');
      expect(channels.map((r) => [r.distanceM, r.delayMs, r.trimDb])).toEqual(cs.mains.map((m) => [m.distanceM.toFixed(2), m.delayMs.toFixed(2), m.trimDb.toFixed(1)]));
      expect(subs.map((r) => [r.distanceM, r.delayMs, r.gainDb])).toEqual(cs.subs.map((s) => [s.distanceM.toFixed(2), s.delayMs.toFixed(2), s.gainDb.toFixed(1)]));

      const share = await team.clients.editor.post(`/api/v1/systems/${system.id}/share-links`);
      expect(share.status).toBe(201);
      const pages = [await team.clients.viewer.get(`/systems/${system.id}/sheet`), await new Client().get(`/s/${share.body.token}`)];
      for (const page of pages) {
        expect(page.status).toBe(200);
        doc.speakers.forEach((s, i) => {
          const m = cs.mains[i]!;
          expect(cellText(page.text, `sheet-distance-${s.channel}`)).toBe(`${m.distanceM.toFixed(2)} m`);
          expect(cellText(page.text, `sheet-delay-${s.channel}`)).toBe(`${m.delayMs.toFixed(2)} ms`);
          expect(cellText(page.text, `sheet-trim-${s.channel}`)).toBe(`${signedText(m.trimDb, 1)} dB`);
        });
        doc.subs.forEach((s, j) => {
          const x = cs.subs[j]!;
          expect(cellText(page.text, `sheet-sub-distance-${s.id}`)).toBe(`${x.distanceM.toFixed(2)} m`);
          expect(cellText(page.text, `sheet-sub-delay-${s.id}`)).toBe(`${x.delayMs.toFixed(2)} ms`);
          expect(cellText(page.text, `sheet-sub-gain-${s.id}`)).toBe(`${signedText(x.gainDb, 1)} dB`);
        });
      }
    }, 120_000);
  }
});
