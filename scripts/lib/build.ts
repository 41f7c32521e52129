import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { projectRoot } from './env-file';
import { run } from './run';

const SOURCES = ['app', 'components', 'dsp', 'lib', 'models', 'migrations', 'public', 'package-lock.json', 'next.config.mjs', 'tailwind.config.ts', 'postcss.config.mjs', 'tsconfig.json'];

function newestMtime(p: string): number {
  if (!existsSync(p)) return 0;
  const st = statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

/** Builds the production app unless .next holds a build newer than every source file. */
export function buildIfNeeded(force = false): void {
  const buildId = path.join(projectRoot, '.next', 'BUILD_ID');
  const built = existsSync(buildId) ? statSync(buildId).mtimeMs : 0;
  const newest = Math.max(...SOURCES.map((s) => newestMtime(path.join(projectRoot, s))));
  if (!force && built > newest) {
    console.log('• production build is up to date');
    return;
  }
  console.log('• building the app (next build)');
  run(path.join(projectRoot, 'node_modules', '.bin', 'next'), ['build'], { cwd: projectRoot, env: { ...process.env, NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1' } });
}
