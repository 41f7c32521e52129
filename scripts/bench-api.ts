// Seamline compute-API benchmark: prints figures, asserts nothing. Run: npx tsx scripts/bench-api.ts
// (the lead wires it up as `npm run bench:api`). It loads POST /api/v1/blend with autocannon (32 connections,
// a bounded run) at BENCH_URL (default http://127.0.0.1:3000, the production build), then serves the same
// request through a bare node:http server started here — the same zod parse, the same dsp call, the same JSON —
// and prints both with their ratio, so the cost of the framework is visible beside the cost of the mathematics.
// Environment: BENCH_URL, BENCH_DURATION_S (default 15), BENCH_CONNECTIONS (default 32).
import autocannon from 'autocannon';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { computeBlend } from '../lib/system-model/blend';
import { blendRequestSchema } from '../lib/validations/compute-blend';

const BASE_URL = (process.env.BENCH_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 15);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 32);
const TARGET_RPS = 800;
const TARGET_P99_MS = 60;

/** 527 points (10 Hz–20 kHz at 48 per octave): LR4 high-pass mains; BW2 low-pass sub with delay, distance and inverted polarity. */
const BODY = JSON.stringify({
  temperatureC: 20,
  grid: { startHz: 10, stopHz: 20000, pointsPerOctave: 48 },
  paths: [
    { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 3.2 },
    { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
  ],
});

interface Figures {
  requestsPerS: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  total: number;
}

async function load(url: string): Promise<Figures> {
  const result = await autocannon({
    url,
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: BODY,
    connections: CONNECTIONS,
    duration: DURATION_S,
  });
  return {
    requestsPerS: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    total: result.requests.total,
  };
}

async function probe(url: string): Promise<{ status: number; points: number; bytes: number } | string> {
  try {
    const res = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: BODY });
    const text = await res.text();
    const points = res.ok ? (JSON.parse(text) as { frequencyHz: number[] }).frequencyHz.length : 0;
    return { status: res.status, points, bytes: text.length };
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}

/** A bare node:http server doing what the route does: read, parse with the same schema, compute, answer JSON. */
function bareServer(): Promise<Server> {
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      try {
        const input = blendRequestSchema.parse(JSON.parse(Buffer.concat(chunks).toString('utf8')));
        const body = JSON.stringify(computeBlend(input));
        res.writeHead(200, { 'content-type': 'application/json', 'cache-control': 'no-store' });
        res.end(body);
      } catch (error) {
        res.writeHead(400, { 'content-type': 'application/json' });
        res.end(JSON.stringify({ error: { code: 'invalid', message: error instanceof Error ? error.message : 'bad request' } }));
      }
    });
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(server)));
}

const fmt = (f: Figures) =>
  `${f.requestsPerS.toFixed(0).padStart(7)} req/s   p50 ${f.p50Ms.toFixed(1).padStart(6)} ms   p99 ${f.p99Ms.toFixed(1).padStart(6)} ms   errors ${f.errors}   non-2xx ${f.non2xx}   (${f.total} requests)`;

async function main() {
  console.log(`POST /api/v1/blend, 527 points, ${CONNECTIONS} connections, ${DURATION_S} s per run`);
  const appUrl = `${BASE_URL}/api/v1/blend`;
  const appProbe = await probe(appUrl);
  let app: Figures | null = null;
  if (typeof appProbe === 'string' || appProbe.status !== 200) {
    console.log(`app      ${appUrl}: not answering 200 (${typeof appProbe === 'string' ? appProbe : `status ${appProbe.status}`}); skipped`);
  } else {
    console.log(`app      ${appUrl}: ${appProbe.points} points, ${(appProbe.bytes / 1024).toFixed(1)} kB answer`);
    app = await load(appUrl);
    console.log(`app      ${fmt(app)}`);
  }

  const server = await bareServer();
  const { port } = server.address() as AddressInfo;
  const bareUrl = `http://127.0.0.1:${port}/`;
  const bareProbe = await probe(bareUrl);
  console.log(`bare     node:http on :${port}: ${typeof bareProbe === 'string' ? bareProbe : `${bareProbe.points} points, ${(bareProbe.bytes / 1024).toFixed(1)} kB answer`}`);
  const bare = await load(bareUrl);
  console.log(`bare     ${fmt(bare)}`);
  server.close();

  if (app) {
    console.log(`ratio    app / bare: ${(app.requestsPerS / bare.requestsPerS).toFixed(2)}× the throughput, ${(app.p99Ms / Math.max(bare.p99Ms, 0.01)).toFixed(2)}× the p99`);
    const met = app.requestsPerS >= TARGET_RPS && app.p99Ms < TARGET_P99_MS && app.errors === 0 && app.non2xx === 0;
    console.log(`target   ≥ ${TARGET_RPS} req/s with p99 < ${TARGET_P99_MS} ms and no errors: ${met ? 'met' : 'not met'} (measure on the production build; a dev server is far slower)`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
