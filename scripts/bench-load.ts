/**
 * npm run bench:load — autocannon against a running production build (BENCH_URL, default
 * http://127.0.0.1:3000): the compute routes and the Library at 64 connections for LOAD_SECONDS
 * (default 60), LOAD_RUNS times (default 3), printing requests/s, p50, p99, errors and the server's
 * resident memory before and after each run. Bounded; loopback only; asserts nothing.
 */
import './lib/load-env';
import { readFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import autocannon from 'autocannon';
import { demoSessionCookie } from './lib/demo-session';

const base = (process.env.BENCH_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const seconds = Math.min(300, Number(process.env.LOAD_SECONDS ?? 60));
const runs = Math.min(5, Number(process.env.LOAD_RUNS ?? 3));

function serverPid(port: number): number | null {
  const out = spawnSync('ss', ['-ltnpH', `sport = :${port}`], { encoding: 'utf8' }).stdout ?? '';
  const m = /pid=(\d+)/.exec(out);
  return m ? Number(m[1]) : null;
}

function rssMb(pid: number | null): number {
  if (!pid) return NaN;
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1]);
    return kb / 1024;
  } catch {
    return NaN;
  }
}

const blendBody = JSON.stringify({
  temperatureC: 20,
  grid: { startHz: 10, stopHz: 20000, pointsPerOctave: 48 },
  paths: [
    { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
    { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
  ],
});
const modesBody = JSON.stringify({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 200, temperatureC: 20, rt60S: 0.4 });

export interface LoadRun {
  run: number;
  requestsPerS: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  rssBeforeMb: number;
  rssAfterMb: number;
}

export async function benchLoad(): Promise<LoadRun[]> {
  const port = Number(new URL(base).port || 80);
  const pid = serverPid(port);
  const cookie = await demoSessionCookie(base);
  const results: LoadRun[] = [];
  for (let run = 1; run <= runs; run++) {
    const before = rssMb(pid);
    const r = await autocannon({
      url: base,
      connections: 64,
      duration: seconds,
      timeout: 20,
      requests: [
        { method: 'POST', path: '/api/v1/blend', headers: { 'content-type': 'application/json' }, body: blendBody },
        { method: 'POST', path: '/api/v1/room-modes', headers: { 'content-type': 'application/json' }, body: modesBody },
        { method: 'GET', path: '/api/v1/systems?page=1', headers: { cookie } },
      ],
    });
    const after = rssMb(pid);
    results.push({ run, requestsPerS: r.requests.average, p50Ms: r.latency.p50, p99Ms: r.latency.p99, errors: r.errors + r.timeouts, non2xx: r.non2xx, rssBeforeMb: before, rssAfterMb: after });
    console.log(`run ${run}: ${r.requests.average.toFixed(0)} req/s, p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, errors ${r.errors + r.timeouts}, non-2xx ${r.non2xx}, server RSS ${before.toFixed(0)} → ${after.toFixed(0)} MB`);
  }
  return results;
}

if (require.main === module) {
  console.log(`bench:load against ${base}: ${runs} run(s) of ${seconds} s at 64 connections (blend, room-modes, Library list)`);
  benchLoad().catch((e) => {
    console.error(`bench:load failed: ${e instanceof Error ? e.message : e}`);
    process.exit(1);
  });
}
