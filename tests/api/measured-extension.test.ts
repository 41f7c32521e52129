import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, signedInClient } from '../helpers/http';

/** An invented sealed mains speaker: |H|² = x⁴/(1 + x⁴), x = f/50 Hz (Butterworth Q; Small 1972), so −3 dB at 50 Hz. */
const HZ = Array.from({ length: 241 }, (_, i) => 10 * 2 ** (i / 24));
const sealed = (offsetDb = 0) => ({ frequencyHz: HZ, magnitudeDb: HZ.map((f) => offsetDb + 10 * Math.log10((f / 50) ** 4 / (1 + (f / 50) ** 4))) });
const csv = (c: { frequencyHz: number[]; magnitudeDb: number[] }) => ['# invented sealed mains', ...c.frequencyHz.map((f, i) => `${f},${c.magnitudeDb[i]}`)].join('\n');
const form = (text: string, fields: Record<string, string>) => {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type: 'text/csv' }), 'mains.csv');
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
};

describe('POST /api/v1/measured/extension and the measurement list filters', () => {
  let owner: Client;
  let other: Client;
  let systemId: string;
  const made: string[] = [];

  beforeAll(async () => {
    [owner, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('other@seamline.test')]);
    const ws = await owner.get('/api/v1/workspaces');
    const larkspurId = ws.body.items.find((w: { name: string }) => w.name === 'Larkspur AV').id;
    const systems = await owner.get(`/api/v1/systems?workspaceId=${larkspurId}`);
    systemId = systems.body.items.find((s: { name: string }) => s.name === 'Juniper Lane screening room').id;
  });

  afterAll(async () => {
    for (const id of made) await owner.delete(`/api/v1/measurements/${id}`);
  });

  it('inline curves need no session: the −3 dB point of a sealed box within 0.5 Hz of 50 Hz (Small 1972), a crossover judged', async () => {
    const res = await new Client().post('/api/v1/measured/extension', { curves: [sealed(), sealed(-2)], crossoverHz: 80 });
    expect(res.status, res.text).toBe(200);
    expect(Math.abs(res.body.pointsHz.minus3 - 50)).toBeLessThan(0.5);
    expect(res.body).toMatchObject({ averagedFrom: 2, band: { startHz: 200, stopHz: 2000 }, crossover: { verdict: 'clear' } });
    // Power average of 0 and −2 dB: 10·log10((1 + 10^−0.2)/2) = −0.9 dB (common practice).
    expect(res.body.meanLevelDb).toBeCloseTo(10 * Math.log10((1 + 10 ** -0.2) / 2), 1);
  });

  it('refuses with 400 naming the field: a band outside the data, no curves, a bad curve', async () => {
    const c = new Client();
    const band = await c.post('/api/v1/measured/extension', { curves: [sealed()], band: { startHz: 200, stopHz: 20000 } });
    expect(band.status).toBe(400);
    expect(band.body.error.issues.map((i: { path: string }) => i.path)).toContain('band');
    const none = await c.post('/api/v1/measured/extension', { curves: [] });
    expect(none.status).toBe(400);
    expect(none.body.error.issues.map((i: { path: string }) => i.path)).toContain('curves');
  });

  it('a stored measurement needs a session and the workspace; the list filters by seat and role, ignoring case', async () => {
    const up = await owner.post('/api/v1/measurements', form(csv(sealed()), { name: 'Extension test mains (invented)', systemId, seat: 'Ext Test Seat 7', role: 'mains' }));
    expect(up.status, up.text).toBe(201);
    made.push(up.body.id);
    const other2 = await owner.post('/api/v1/measurements', form(csv(sealed()), { name: 'Extension test sub (invented)', systemId, seat: 'Ext Test Seat 7', role: 'sub' }));
    made.push(other2.body.id);

    const body = { curves: [{ measurementId: up.body.id }] };
    expect((await new Client().post('/api/v1/measured/extension', body)).status).toBe(401);
    expect((await other.post('/api/v1/measured/extension', body)).status).toBe(404);
    const mine = await owner.post('/api/v1/measured/extension', body);
    expect(mine.status, mine.text).toBe(200);
    expect(mine.body.names).toEqual(['Extension test mains (invented)']);
    expect(Math.abs(mine.body.pointsHz.minus3 - 50)).toBeLessThan(0.5);

    const ids = async (query: string) => ((await owner.get(`/api/v1/measurements?systemId=${systemId}${query}`)).body.items as { id: string }[]).map((m) => m.id);
    expect(await ids('&seat=ext%20test%20SEAT%207&role=MAINS')).toEqual([up.body.id]);
    expect((await ids('&seat=Ext%20Test%20Seat%207')).sort()).toEqual([...made].sort());
    expect(await ids('&seat=Ext%20Test%20Seat')).toEqual([]);
    expect((await owner.get('/api/v1/measurements?seat=')).status).toBe(400);
  });
});
