/**
 * npm run test:instances — tests/instances/two-instances.test.ts by hand: starts two production instances of an
 * existing build (`npx next build` first; NEXT_DIST_DIR names another build folder) on DATABASE_URL (default: the
 * local development database, migrated), runs the test against them and stops them. npm test runs the same step
 * on its throw-away database. Exit code 0 when every case passes.
 */
import './lib/load-env';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { ensureSecret, projectRoot } from './lib/env-file';
import { runTwoInstances } from './lib/instances';

async function main() {
  const distDir = process.env.NEXT_DIST_DIR || '.next';
  if (!existsSync(path.join(projectRoot, distDir, 'BUILD_ID'))) {
    console.error(`no production build in ${distDir}/: run \`npx next build\` (with the same NEXT_DIST_DIR) first`);
    process.exit(1);
  }
  ensureSecret(); // both instances sign sessions with the same secret
  process.exit(await runTwoInstances({ ...process.env, NEXT_TELEMETRY_DISABLED: '1' }));
}

void main();
