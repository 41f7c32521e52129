import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const projectRoot = path.resolve(__dirname, '..', '..');

/** Loads .env.local (if present) into process.env without overriding what the shell set. */
export function loadLocalEnv(file = path.join(projectRoot, '.env.local')): void {
  if (!existsSync(file)) return;
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    const m = /^\s*([A-Z0-9_]+)\s*=\s*(.*)\s*$/.exec(line);
    if (!m || line.trimStart().startsWith('#')) continue;
    const [, key, raw] = m;
    if (key && process.env[key] === undefined) process.env[key] = (raw ?? '').replace(/^"(.*)"$/, '$1');
  }
}

/** Makes sure NEXTAUTH_SECRET exists, writing a fresh one into the ignored .env.local on first start. */
export function ensureSecret(file = path.join(projectRoot, '.env.local')): void {
  loadLocalEnv(file);
  if (process.env.NEXTAUTH_SECRET) return;
  const secret = randomBytes(32).toString('base64url');
  const before = existsSync(file) ? readFileSync(file, 'utf8') : '# Local settings written by npm start; not committed.\n';
  writeFileSync(file, `${before.replace(/\n?$/, '\n')}NEXTAUTH_SECRET=${secret}\n`, { mode: 0o600 });
  process.env.NEXTAUTH_SECRET = secret;
  console.log('• generated NEXTAUTH_SECRET into .env.local');
}
