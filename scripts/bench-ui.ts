/**
 * npm run bench:ui — figures from headless Chromium against a running production build
 * (BENCH_URL, default http://127.0.0.1:3000). Prints; asserts nothing.
 *  1. the editor's first-load JavaScript, gzipped (every script the page loads, compressed with zlib);
 *  2. editing the crossover and seeing the Blend plot updated: median and p95 over 30 edits;
 *  3. Seat balance in its Web Worker, from Run to the answer: the demo System and 4 subs × 8 seats
 *     (scripts/lib/seat-balance-ui-bench.ts);
 *  4. the Presenter view's sweep frame rate (scripts/bench-ui-sweep.ts, when present).
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from '@playwright/test';
import { benchSeatBalanceUi, type SeatBalanceUiFigure } from './lib/seat-balance-ui-bench';

const base = (process.env.BENCH_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const args = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic', '--no-first-run'];

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * (s.length - 1) + 0.5))] ?? NaN;
};

export interface UiFigures {
  firstLoadJsGzipKb: number;
  crossoverEditMedianMs: number;
  crossoverEditP95Ms: number;
  edits: number;
  seatBalance: SeatBalanceUiFigure[];
}

export async function benchUi(): Promise<UiFigures> {
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args });
  try {
    const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
    const scripts = new Set<string>();
    page.on('response', (r) => {
      if (r.request().resourceType() === 'script' && r.url().startsWith(base)) scripts.add(r.url());
    });
    await page.goto(`${base}/systems/new?panel=blend`, { waitUntil: 'networkidle' });
    let gzBytes = 0;
    for (const url of scripts) {
      const body = await (await fetch(url)).arrayBuffer();
      gzBytes += gzipSync(Buffer.from(body), { level: 9 }).byteLength;
    }

    const field = page.getByLabel(/^crossover/i).first();
    await field.waitFor({ timeout: 30_000 });
    await page.locator('#panel-blend svg').first().waitFor();
    const times: number[] = [];
    const edits = 30;
    for (let i = 0; i < edits; i++) {
      const hz = 60 + ((i * 7) % 60);
      const handle = await field.elementHandle();
      const ms = await page.evaluate(
        ({ el, value }) =>
          new Promise<number>((resolve, reject) => {
            const svg = document.querySelector('#panel-blend svg');
            if (!svg || !el) return reject(new Error('no plot or field'));
            const start = performance.now();
            const observer = new MutationObserver(() => {
              observer.disconnect();
              requestAnimationFrame(() => resolve(performance.now() - start));
            });
            observer.observe(svg, { subtree: true, attributes: true, childList: true, characterData: true });
            const input = el as HTMLInputElement;
            const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
            setter.call(input, String(value));
            input.dispatchEvent(new Event('input', { bubbles: true }));
            setTimeout(() => {
              observer.disconnect();
              reject(new Error('the plot did not change within 5 s'));
            }, 5000);
          }),
        { el: handle, value: hz },
      );
      times.push(ms);
      await page.waitForTimeout(120);
    }
    return {
      firstLoadJsGzipKb: gzBytes / 1024,
      crossoverEditMedianMs: quantile(times, 0.5),
      crossoverEditP95Ms: quantile(times, 0.95),
      edits,
      seatBalance: await benchSeatBalanceUi(browser, base),
    };
  } finally {
    await browser.close();
  }
}

if (require.main === module) {
  benchUi()
    .then((f) => {
      console.log(`editor first-load JavaScript (gzip): ${f.firstLoadJsGzipKb.toFixed(1)} kB   (target ≤ 250 kB)`);
      console.log(`crossover edit → plot updated over ${f.edits} edits: median ${f.crossoverEditMedianMs.toFixed(1)} ms, p95 ${f.crossoverEditP95Ms.toFixed(1)} ms   (target p95 ≤ 100 ms)`);
      for (const s of f.seatBalance) console.log(`Seat balance in the browser's worker, ${s.label}${s.placement ? ', with the placement search' : ''}: ${(s.elapsedMs / 1000).toFixed(2)} s, ${s.evaluated} settings evaluated`);
      const sweep = path.join(__dirname, 'bench-ui-sweep.ts');
      if (existsSync(sweep)) spawnSync(path.join(__dirname, '..', 'node_modules', '.bin', 'tsx'), [sweep], { stdio: 'inherit', env: process.env });
    })
    .catch((e) => {
      console.error(`bench:ui failed: ${e instanceof Error ? e.message : e}`);
      process.exit(1);
    });
}
