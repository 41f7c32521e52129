import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { promisify } from 'node:util';
import openapiTS, { astToString } from 'openapi-typescript';
import ts from 'typescript';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl } from '../helpers/env';
import { Client } from '../helpers/http';

/**
 * A client generated from the served document by a standard generator must compile and work: openapi-typescript
 * writes the types, a small program calls POST /api/v1/blend and GET /api/v1/systems through openapi-fetch with typed
 * bodies and answers, the project's TypeScript compiles it in strict mode, and the compiled blend call runs against
 * the app.
 */
const PROGRAM = `import createClient from 'openapi-fetch';
import type { paths } from './schema.js';

/** LR4 high-pass and LR4 low-pass at 80 Hz, no delay: the sum is an all-pass. */
export async function blend(baseUrl: string): Promise<{ firstHz: number; sumDb: number[]; flatnessDb: number | null }> {
  const client = createClient<paths>({ baseUrl });
  const { data, error } = await client.POST('/api/v1/blend', {
    body: {
      temperatureC: 20,
      grid: { startHz: 20, stopHz: 320, pointsPerOctave: 12 },
      paths: [
        { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
        { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
      ],
    },
  });
  if (error) throw new Error('blend refused: ' + error.error.message);
  const answer = data;
  const sumDb: number[] = answer.sum.magnitudeDb;
  const flatnessDb: number | null = answer.metrics ? answer.metrics.flatnessDb : null;
  return { firstHz: answer.frequencyHz[0] ?? Number.NaN, sumDb, flatnessDb };
}

/** The names of the Systems a personal access token can read, sorted by name. */
export async function systemNames(baseUrl: string, token: string): Promise<string[]> {
  const client = createClient<paths>({ baseUrl, headers: { Authorization: 'Bearer ' + token } });
  const { data, error } = await client.GET('/api/v1/systems', { params: { query: { sort: 'name', page: 1 } } });
  if (error) throw new Error(error.error.code);
  return data.items.map((s) => s.name);
}
`;

let dir: string;

beforeAll(async () => {
  const res = await new Client().get('/api/v1/openapi.json');
  if (res.status !== 200) throw new Error(`GET /api/v1/openapi.json answered ${res.status}`);
  dir = mkdtempSync(path.join(tmpdir(), 'seamline-openapi-client-'));
  symlinkSync(path.resolve(__dirname, '../../node_modules'), path.join(dir, 'node_modules'), 'dir');
  writeFileSync(path.join(dir, 'package.json'), JSON.stringify({ type: 'module', private: true }));
  writeFileSync(path.join(dir, 'schema.ts'), astToString(await openapiTS(res.body)));
  writeFileSync(path.join(dir, 'client.ts'), PROGRAM);
}, 60_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('a client generated from /api/v1/openapi.json (openapi-typescript + openapi-fetch)', () => {
  it('compiles in strict mode with no diagnostics, typed calls to the Blend and the Library', () => {
    const program = ts.createProgram([path.join(dir, 'client.ts')], {
      strict: true,
      noUncheckedIndexedAccess: true,
      target: ts.ScriptTarget.ES2022,
      module: ts.ModuleKind.NodeNext,
      moduleResolution: ts.ModuleResolutionKind.NodeNext,
      lib: ['lib.es2022.d.ts', 'lib.dom.d.ts'],
      types: [],
      outDir: path.join(dir, 'out'),
      rootDir: dir,
    });
    const diagnostics = [...ts.getPreEmitDiagnostics(program), ...program.emit().diagnostics];
    const text = ts.formatDiagnostics(diagnostics, { getCanonicalFileName: (f) => f, getCurrentDirectory: () => dir, getNewLine: () => '\n' });
    expect(text).toBe('');
  }, 120_000);

  it('runs: the compiled blend call gets the LR4 all-pass sum, flat at 0 dB (published: Linkwitz 1976)', async () => {
    const url = pathToFileURL(path.join(dir, 'out', 'client.js')).href;
    const script = `import { blend } from ${JSON.stringify(url)}; console.log(JSON.stringify(await blend(${JSON.stringify(baseUrl())})));`;
    const { stdout } = await promisify(execFile)(process.execPath, ['--input-type=module', '-e', script], { cwd: dir });
    const answer = JSON.parse(stdout) as { firstHz: number; sumDb: number[]; flatnessDb: number | null };
    expect(answer.firstHz).toBe(20);
    expect(answer.sumDb.length).toBe(49);
    // An LR4 crossover sums to an all-pass: |H| = 1 at every frequency (0.001 dB rounding).
    for (const db of answer.sumDb) expect(Math.abs(db)).toBeLessThanOrEqual(0.002);
    expect(answer.flatnessDb).toBeLessThanOrEqual(0.01);
  }, 60_000);
});
