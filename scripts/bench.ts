/**
 * npm run bench — runs bench:dsp, bench:api, bench:ui and bench:load against a production build
 * it serves itself (on a free port, with the local database), and writes bench/REPORT.md: one
 * table of figure, target and measured, the machine, and every script's own output. Prints; never
 * asserts. LOAD_SECONDS / LOAD_RUNS shorten bench:load.
 */
import './lib/load-env';
import { spawn } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { projectRoot } from './lib/env-file';
import { ensurePostgres } from './lib/postgres';
import { migrate } from './lib/database';
import { buildIfNeeded } from './lib/build';
import { serveApp } from './lib/serve';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const a = s.address();
      s.close(() => resolve(typeof a === 'object' && a ? a.port : 0));
    });
  });
}

function run(script: string, env: NodeJS.ProcessEnv): Promise<string> {
  return new Promise((resolve) => {
    const child = spawn(path.join(projectRoot, 'node_modules', '.bin', 'tsx'), [path.join('scripts', script)], { cwd: projectRoot, env, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (d: Buffer) => {
      process.stdout.write(d);
      out += d.toString();
    });
    child.stderr.on('data', (d: Buffer) => {
      process.stderr.write(d);
      out += d.toString();
    });
    child.once('exit', () => resolve(out));
  });
}

const pick = (text: string, re: RegExp, fmt: (m: RegExpMatchArray) => string = (m) => m[1] ?? ''): string => {
  const m = text.match(re);
  return m ? fmt(m) : 'not measured (see output)';
};

async function main() {
  const { config } = await import('../lib/config');
  await ensurePostgres(config.databaseUrl);
  await migrate(config.databaseUrl);
  const { seedDemo } = await import('./seed');
  await seedDemo();
  buildIfNeeded();
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env = { ...process.env, NEXTAUTH_URL: url, APP_URL: url, PORT: String(port), BENCH_URL: url };
  const server = await serveApp(port, env, { quiet: true });
  const outputs: Record<string, string> = {};
  try {
    for (const [name, script] of [
      ['bench:dsp', 'bench-dsp.ts'],
      ['bench:api', 'bench-api.ts'],
      ['bench:ui', 'bench-ui.ts'],
      ['bench:load', 'bench-load.ts'],
    ] as const) {
      console.log(`\n━━ ${name} ━━`);
      outputs[name] = await run(script, env);
    }
  } finally {
    server.kill('SIGTERM');
  }

  const d = outputs['bench:dsp'] ?? '';
  const a = outputs['bench:api'] ?? '';
  const u = outputs['bench:ui'] ?? '';
  const l = outputs['bench:load'] ?? '';
  const loadRuns = [...l.matchAll(/run (\d+): (\d+) req\/s, p50 ([\d.]+) ms, p99 ([\d.]+) ms, errors (\d+), non-2xx (\d+), server RSS (\d+) → (\d+) MB/g)];
  const rows: [string, string, string][] = [
    ['two-way blend, 527 points, sum only (dsp)', '≤ 40 µs median', pick(d, /blendGrid \+ into\):\s+([\d.]+ µs)/)],
    ['two-way blend, 527 points, every path and the sum (dsp)', '—', pick(d, /the blend route\):\s+([\d.]+ µs)/)],
    ['scipy.signal.freqs + numpy, same workload, ratio', '≥ 7×', pick(d, /ratio scipy \/ Seamline \(medians\): ([\d.]+×)/)],
    ['crossover sweep, 12 candidates (dsp)', '≤ 20 ms', pick(d, /polarity search:\s+([\d.]+ ms)/)],
    ['room modes to 300 Hz + modal sums 2 × 6 × 500 (dsp)', '≤ 20 ms', pick(d, /all pairs in one call\):\s+([\d.]+ ms)/)],
    ['POST /api/v1/blend, 32 connections: requests/s', '≥ 800', pick(a, /^app\s+(\d[\d.]*) req\/s/m)],
    ['POST /api/v1/blend, 32 connections: p99', '< 60 ms', pick(a, /^app\s+.*?p99\s+([\d.]+) ms/m, (m) => `${m[1]} ms`)],
    ['app / bare node:http throughput', '—', pick(a, /app \/ bare: ([\d.]+×)/)],
    ['editor first-load JavaScript (gzip)', '≤ 250 kB', pick(u, /gzip\): ([\d.]+ kB)/)],
    ['crossover edit → Blend plot updated, p95 of 30', '≤ 100 ms', pick(u, /p95 ([\d.]+ ms)/)],
    ['Presenter view sweep frame rate', '≥ 30 fps', pick(u, /= ([\d.]+) frames per second/, (m) => `${m[1]} fps`)],
    ...loadRuns.map((m): [string, string, string] => [`load run ${m[1]} (64 connections): req/s, p50, p99, errors, server RSS`, 'zero errors; memory settles', `${m[2]} req/s, ${m[3]} / ${m[4]} ms, ${Number(m[5]) + Number(m[6])} errors, ${m[7]} → ${m[8]} MB`]),
  ];
  const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'CPU'}, ${(os.totalmem() / 2 ** 30).toFixed(0)} GiB, ${os.type()} ${os.release()}, Node ${process.version}, load average ${os.loadavg().map((x) => x.toFixed(1)).join(' ')}`;
  const date = new Date().toISOString().slice(0, 16).replace('T', ' ');
  const report = [
    '# Seamline benchmark report',
    '',
    `Figures from one run of \`npm run bench\` on ${date} UTC, on one machine: ${machine}. They are what this run measured, not guarantees; a loaded or slower machine gives other numbers.`,
    '',
    '| figure | target | measured |',
    '|---|---|---|',
    ...rows.map((r) => `| ${r.join(' | ')} |`),
    '',
    ...Object.entries(outputs).flatMap(([k, v]) => [`## ${k}`, '', '```', v.trim(), '```', '']),
  ].join('\n');
  mkdirSync(path.join(projectRoot, 'bench'), { recursive: true });
  writeFileSync(path.join(projectRoot, 'bench', 'REPORT.md'), report);
  console.log('\nwrote bench/REPORT.md');
  process.exit(0);
}

main().catch((e) => {
  console.error(`bench failed: ${e instanceof Error ? e.message : e}`);
  process.exit(1);
});
