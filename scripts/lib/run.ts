import { spawnSync, type SpawnSyncOptions } from 'node:child_process';

/** Runs a command, streaming its output; throws with the command line when it fails. */
export function run(cmd: string, args: string[], options: SpawnSyncOptions = {}): void {
  const result = spawnSync(cmd, args, { stdio: 'inherit', ...options });
  if (result.status !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} failed (exit ${result.status ?? result.signal})`);
  }
}

/** Runs a command and returns its stdout; null when it fails. */
export function capture(cmd: string, args: string[], options: SpawnSyncOptions = {}): string | null {
  const result = spawnSync(cmd, args, { encoding: 'utf8', ...options });
  return result.status === 0 ? String(result.stdout) : null;
}

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Installs Debian packages when a command is missing (apt-get as root, else sudo -n). */
export function aptInstall(packages: string[]): void {
  const prefix = isRoot ? [] : ['sudo', '-n'];
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const apt = (args: string[]) => spawnSync(prefix[0] ?? 'apt-get', prefix.length ? [...prefix.slice(1), 'apt-get', ...args] : args, { stdio: 'inherit', env });
  console.log(`• installing Debian packages: ${packages.join(' ')}`);
  let r = apt(['install', '-y', '--no-install-recommends', ...packages]);
  if (r.status !== 0) {
    apt(['update']);
    r = apt(['install', '-y', '--no-install-recommends', ...packages]);
  }
  if (r.status !== 0) throw new Error(`could not install ${packages.join(' ')} with apt-get`);
}
