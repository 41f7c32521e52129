// Seamline compute-API benchmark: prints figures, asserts nothing. Run: npm run bench:api (npx tsx scripts/bench-api.ts).
//
// What it measures: POST /api/v1/blend (527 points) on the app at BENCH_URL (default http://127.0.0.1:3000, a
// production build: `next start`), against a bare node:http server doing the same work — the same zod schema, the same
// computeBlend, JSON.stringify, one write — so the cost of the framework is visible beside the cost of the mathematics.
// How: each server runs in its own process (the bare one is this script started again with --bare-server), and
// autocannon (BENCH_CONNECTIONS connections, default 32) runs in this process, so both servers meet the same load
// generator on the same machine. Both get a warm-up run first (not counted); then BENCH_ROUNDS rounds (default 3) of
// BENCH_DURATION_S seconds (default 10) each, app and bare taking turns to go first; the summary takes the median of
// the rounds and shows their spread. Target (issue 18): the app reaches at least 0.5× the bare throughput with a p99
// under 100 ms and no errors.
//
// The app's API limits (lib/api-limits.ts) refuse a load test by design, and every request would count against the
// address's budget shared with anything else on that database: start the server under test with
// SEAMLINE_LIMIT_EXEMPT=127.0.0.1 (the address Next reports for a local client). A 429 on the probe stops the app part.
// BENCH_APP_PID (optional, Linux): the app server's process id, to print its CPU time per request as well.
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { availableParallelism, loadavg } from 'node:os';
import { computeBlend } from '../lib/system-model/blend';
import { blendRequestSchema } from '../lib/validations/compute-blend';

const BASE_URL = (process.env.BENCH_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);
const WARMUP_S = Number(process.env.BENCH_WARMUP_S ?? 3);
const ROUNDS = Math.max(1, Math.round(Number(process.env.BENCH_ROUNDS ?? 3)));
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 32);
const APP_PID = process.env.BENCH_APP_PID ? Number(process.env.BENCH_APP_PID) : null;
/** Issue 18: at least half the bare server's throughput, p99 under 100 ms. */
const TARGET_RATIO = 0.5;
const TARGET_P99_MS = 100;
const BARE_FLAG = '--bare-server';

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
  /** CPU time of the server process per answered request, ms (null when its process cannot be read). */
  cpuMsPerRequest: number | null;
}

/** User + system CPU time of a process, ms, from /proc (Linux); null elsewhere or when it has gone. */
function processCpuMs(pid: number | null): number | null {
  if (pid === null) return null;
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    const ticksPerS = 100; // USER_HZ, 100 on every Linux this runs on
    return ((Number(fields[11]) + Number(fields[12])) / ticksPerS) * 1000;
  } catch {
    return null;
  }
}

async function load(url: string, durationS: number, pid: number | null): Promise<Figures> {
  const cpuBefore = processCpuMs(pid);
  const result = await autocannon({
    url,
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: BODY,
    connections: CONNECTIONS,
    duration: durationS,
  });
  const cpuAfter = processCpuMs(pid);
  const answered = result.requests.total;
  return {
    requestsPerS: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    total: answered,
    cpuMsPerRequest: cpuBefore !== null && cpuAfter !== null && answered > 0 ? (cpuAfter - cpuBefore) / answered : null,
  };
}

async function probe(url: string): Promise<{ status: number; text: string } | string> {
  try {
    const res = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: BODY });
    return { status: res.status, text: await res.text() };
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  }
}

/** The bare server (this script with --bare-server): read, parse with the same schema, compute, answer JSON in one write. */
function serveBare(): void {
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
  server.listen(0, '127.0.0.1', () => {
    const address = server.address();
    console.log(`listening ${typeof address === 'object' && address ? address.port : 0}`);
  });
  // The parent closes our stdin when it is done (or dies): leave with it.
  process.stdin.on('end', () => process.exit(0));
  process.stdin.resume();
}

/** Starts the bare server in its own process (the same node and loader flags as this one); resolves with its port. */
function startBare(): Promise<{ child: ChildProcess; port: number }> {
  const child = spawn(process.execPath, [...process.execArgv, process.argv[1] as string, BARE_FLAG], { stdio: ['pipe', 'pipe', 'inherit'] });
  return new Promise((resolve, reject) => {
    let out = '';
    child.stdout?.on('data', (d: Buffer) => {
      out += d.toString('utf8');
      const m = /listening (\d+)/.exec(out);
      if (m) resolve({ child, port: Number(m[1]) });
    });
    child.once('exit', (code) => reject(new Error(`the bare server exited with code ${code}`)));
  });
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? (s[mid] as number) : ((s[mid - 1] as number) + (s[mid] as number)) / 2;
};
const spread = (xs: number[], digits = 0) => `${Math.min(...xs).toFixed(digits)}–${Math.max(...xs).toFixed(digits)}`;
const cpu = (f: Figures) => (f.cpuMsPerRequest === null ? '' : `   cpu ${f.cpuMsPerRequest.toFixed(2)} ms/req`);
const fmt = (f: Figures) =>
  `${f.requestsPerS.toFixed(0).padStart(6)} req/s   p50 ${f.p50Ms.toFixed(1).padStart(6)} ms   p99 ${f.p99Ms.toFixed(1).padStart(6)} ms   errors ${f.errors}   non-2xx ${f.non2xx}   (${f.total} requests)${cpu(f)}`;

function summary(label: string, runs: Figures[]): string {
  const rps = runs.map((r) => r.requestsPerS);
  const cpus = runs.map((r) => r.cpuMsPerRequest).filter((c): c is number => c !== null);
  const cpuText = cpus.length ? `   cpu ${median(cpus).toFixed(2)} ms/req` : '';
  return `${label} median ${median(rps).toFixed(0).padStart(6)} req/s (spread ${spread(rps)})   p50 ${median(runs.map((r) => r.p50Ms)).toFixed(1)} ms   p99 ${median(runs.map((r) => r.p99Ms)).toFixed(1)} ms (spread ${spread(runs.map((r) => r.p99Ms))})${cpuText}`;
}

async function main() {
  const [load1, load5] = loadavg();
  console.log(`POST /api/v1/blend, 527 points: ${CONNECTIONS} connections, ${ROUNDS} round(s) of ${DURATION_S} s after a ${WARMUP_S} s warm-up per server`);
  console.log(`method   each server in its own process, autocannon in this one; ${availableParallelism()} cores, load average ${load1?.toFixed(2)} / ${load5?.toFixed(2)} at the start`);
  const appUrl = `${BASE_URL}/api/v1/blend`;
  const appProbe = await probe(appUrl);
  let appOk = false;
  if (typeof appProbe === 'string' || appProbe.status !== 200) {
    const why = typeof appProbe === 'string' ? appProbe : `status ${appProbe.status}`;
    console.log(`app      ${appUrl}: not answering 200 (${why}); skipped`);
    if (typeof appProbe !== 'string' && appProbe.status === 429) console.log('         the API limits refuse a load test: start the server with SEAMLINE_LIMIT_EXEMPT=127.0.0.1');
  } else {
    appOk = true;
    console.log(`app      ${appUrl}: ${(appProbe.text.length / 1024).toFixed(1)} kB answer${APP_PID ? `, process ${APP_PID}` : ''}`);
  }

  const { child, port } = await startBare();
  const bareUrl = `http://127.0.0.1:${port}/`;
  const bareProbe = await probe(bareUrl);
  const bareText = typeof bareProbe === 'string' ? bareProbe : bareProbe.text;
  console.log(`bare     node:http on :${port}, process ${child.pid}: ${(bareText.length / 1024).toFixed(1)} kB answer`);
  if (appOk && typeof appProbe !== 'string') console.log(`answers  byte for byte the same: ${appProbe.text === bareText ? 'yes' : 'NO (the two servers do not do the same work)'}`);

  try {
    if (appOk) await load(appUrl, WARMUP_S, null);
    await load(bareUrl, WARMUP_S, null);
    const app: Figures[] = [];
    const bare: Figures[] = [];
    for (let round = 1; round <= ROUNDS; round++) {
      const order: ('app' | 'bare')[] = round % 2 === 1 ? ['app', 'bare'] : ['bare', 'app'];
      for (const which of order) {
        if (which === 'app' && !appOk) continue;
        const f = which === 'app' ? await load(appUrl, DURATION_S, APP_PID) : await load(bareUrl, DURATION_S, child.pid ?? null);
        (which === 'app' ? app : bare).push(f);
        console.log(`${which.padEnd(4)} ${round}   ${fmt(f)}`);
      }
    }
    console.log(summary('bare  ', bare));
    if (!appOk) return;
    console.log(summary('app   ', app));
    const ratio = median(app.map((a) => a.requestsPerS)) / median(bare.map((b) => b.requestsPerS));
    const perRound = app.map((a, i) => a.requestsPerS / (bare[i] as Figures).requestsPerS);
    const p99 = median(app.map((a) => a.p99Ms));
    console.log(`ratio    app / bare throughput: ${ratio.toFixed(2)}× (medians; per round ${spread(perRound, 2)}×)`);
    const clean = app.every((a) => a.errors === 0 && a.non2xx === 0);
    const met = ratio >= TARGET_RATIO && p99 < TARGET_P99_MS && clean;
    console.log(`target   ≥ ${TARGET_RATIO}× the bare throughput, app p99 < ${TARGET_P99_MS} ms, no errors: ${met ? 'met' : 'not met'} (a production build; a dev server is far slower)`);
  } finally {
    child.stdin?.end();
    child.kill('SIGTERM');
  }
}

if (process.argv.includes(BARE_FLAG)) serveBare();
else
  main().catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
