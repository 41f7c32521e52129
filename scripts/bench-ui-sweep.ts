/**
 * Frame rate of a Lesson sweep in the Presenter view, in headless Chromium: signs in as the demo
 * trainer, opens the demo Lesson's crossover-sweep Step at 1920×1080, plays the sweep for a few
 * seconds and prints the frames per second the page drew (requestAnimationFrame callbacks that
 * committed a new plot; counted by the page in window.__seamlineLessonFrames).
 *
 *   BENCH_URL=http://127.0.0.1:3205 npx tsx scripts/bench-ui-sweep.ts
 *
 * Exported as benchUiSweep() so `npm run bench:ui` can call it. Prints figures; asserts nothing.
 */
import { chromium } from '@playwright/test';

const LAUNCH_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic', '--no-first-run'];

export async function benchUiSweep(baseUrl = process.env.BENCH_URL ?? 'http://127.0.0.1:3000', seconds = 4): Promise<{ fps: number; frames: number; seconds: number }> {
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: LAUNCH_ARGS, headless: true });
  try {
    const context = await browser.newContext({ viewport: { width: 1920, height: 1080 }, baseURL: baseUrl });
    const page = await context.newPage();
    await page.goto('/sign-in');
    await page.waitForLoadState('networkidle');
    await page.getByLabel('E-mail').fill('demo@seamline.test');
    await page.getByLabel('Password').fill('seamline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/library/, { timeout: 60_000 });

    const getJson = (url: string) => page.evaluate(async (u) => (await fetch(u)).json(), url);
    const { items } = (await getJson('/api/v1/lessons')) as { items: { id: string; title: string }[] };
    const demo = items.find((l) => l.title === 'Why the sub and mains cancel');
    if (!demo) throw new Error('the demo Lesson is missing: run `npm run db:seed`');
    const lesson = (await getJson(`/api/v1/lessons/${demo.id}`)) as { steps: { position: number; sweep: { parameter: string; durationS: number } | null }[] };
    const step = lesson.steps.find((s) => s.sweep?.parameter === 'crossoverHz') ?? lesson.steps.find((s) => s.sweep);
    if (!step?.sweep) throw new Error('the demo Lesson has no sweep');

    await page.goto(`/lessons/${demo.id}/present?step=${step.position}`, { timeout: 90_000 });
    await page.getByTestId('presenter-view').filter({ visible: true }).first().waitFor({ timeout: 90_000 });
    await page.getByTestId('sweep-value').filter({ visible: true }).first().waitFor();
    await page.waitForLoadState('networkidle'); // hydrated: the keyboard handler is attached
    const run = Math.min(seconds, step.sweep.durationS - 0.5);
    await page.keyboard.press('Space');
    await page.waitForTimeout(300); // let the first frames settle
    const result = await page.evaluate(async (ms) => {
      const start = window.__seamlineLessonFrames ?? 0;
      const t0 = performance.now();
      await new Promise((r) => setTimeout(r, ms));
      const frames = (window.__seamlineLessonFrames ?? 0) - start;
      const elapsed = (performance.now() - t0) / 1000;
      return { frames, seconds: elapsed };
    }, run * 1000);
    return { ...result, fps: result.frames / result.seconds };
  } finally {
    await browser.close();
  }
}

if (process.argv[1] && /bench-ui-sweep/.test(process.argv[1])) {
  benchUiSweep()
    .then((r) => {
      console.log(`Lesson sweep (Presenter view, 1920×1080, headless Chromium): ${r.frames} frames in ${r.seconds.toFixed(2)} s = ${r.fps.toFixed(1)} frames per second`);
    })
    .catch((e) => {
      console.error(e);
      process.exit(1);
    });
}
