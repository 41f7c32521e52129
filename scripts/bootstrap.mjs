// Plain Node (no dependencies): installs the npm packages when they are missing or stale,
// then runs the TypeScript script named on the command line with tsx.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const lock = path.join(root, 'package-lock.json');
const installed = path.join(root, 'node_modules', '.package-lock.json');
const stale = !existsSync(installed) || (existsSync(lock) && statSync(lock).mtimeMs > statSync(installed).mtimeMs + 1000);
if (stale) {
  console.log('• installing npm packages (npm ci)');
  const r = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
const [script, ...args] = process.argv.slice(2);
const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
const r = spawnSync(tsx, [script, ...args], { cwd: root, stdio: 'inherit' });
process.exit(r.status ?? 1);
