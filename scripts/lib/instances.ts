/**
 * Two more production instances of the app (`next start` on the build in NEXT_DIST_DIR) on the same database, and
 * tests/instances/two-instances.test.ts run against them: what one instance saves, limits or revokes, the other
 * must see. Used by npm test (scripts/test.ts) and by hand through npm run test:instances (scripts/test-instances.ts).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { projectRoot } from './env-file';
import { serveApp } from './serve';

const TEST_FILE = path.join('tests', 'instances', 'two-instances.test.ts');

function freePort(taken: number[]): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => (taken.includes(port) ? freePort(taken).then(resolve, reject) : resolve(port)));
    });
  });
}

/** SIGTERM, then SIGKILL if it has not gone within five seconds; resolves once it has exited. */
function stopProcess(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill('SIGKILL'), 5_000);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

function run(cmd: string, args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: projectRoot, stdio: 'inherit', env });
    child.once('exit', (code) => resolve(code ?? 1));
    child.once('error', () => resolve(1));
  });
}

/**
 * Starts two instances on free ports with `env` (the same DATABASE_URL and NEXTAUTH_SECRET for both; APP_URL and
 * NEXTAUTH_URL, the address of the balancer in front, default to the first instance), waits until both answer, runs
 * vitest on the two-instance test with INSTANCE_A_URL and INSTANCE_B_URL (`vitestArgs` adds reporters), and stops
 * both instances whatever happens. Resolves with vitest's exit code, 1 when an instance would not start.
 */
export async function runTwoInstances(env: NodeJS.ProcessEnv, vitestArgs: string[] = []): Promise<number> {
  const children: ChildProcess[] = [];
  const killAll = () => children.forEach((c) => c.kill('SIGTERM'));
  process.once('exit', killAll); // npm test interrupted: no instance outlives it
  try {
    const ports: number[] = [];
    for (let i = 0; i < 2; i++) ports.push(await freePort(ports));
    const urls = ports.map((p) => `http://127.0.0.1:${p}`);
    const shared = { APP_URL: env.APP_URL ?? urls[0], NEXTAUTH_URL: env.NEXTAUTH_URL ?? env.APP_URL ?? urls[0] };
    for (const port of ports) {
      children.push(await serveApp(port, { ...env, ...shared, PORT: String(port) }, { quiet: true }));
      console.log(`• instance on ${urls[children.length - 1]} (pid ${children.at(-1)!.pid})`);
    }
    return await run(path.join(projectRoot, 'node_modules', '.bin', 'vitest'), ['run', TEST_FILE, ...vitestArgs], {
      ...env,
      INSTANCE_A_URL: urls[0],
      INSTANCE_B_URL: urls[1],
    });
  } catch (e) {
    console.error(`the two instances did not start: ${e instanceof Error ? e.message : e}`);
    return 1;
  } finally {
    await Promise.all(children.map(stopProcess));
    process.removeListener('exit', killAll);
  }
}
