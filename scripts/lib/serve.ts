import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { projectRoot } from './env-file';

/** Starts `next start` on 127.0.0.1 and resolves once it answers HTTP. */
export async function serveApp(port: number, env: NodeJS.ProcessEnv, options: { quiet?: boolean } = {}): Promise<ChildProcess> {
  const child = spawn(path.join(projectRoot, 'node_modules', '.bin', 'next'), ['start', '-H', '127.0.0.1', '-p', String(port)], {
    cwd: projectRoot,
    env: { ...env, NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1' },
    stdio: options.quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  });
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`next start exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (res.status < 500) return child;
    } catch {
      // not up yet
    }
    if (Date.now() > deadline) {
      child.kill();
      throw new Error('the app did not answer within 60 s');
    }
    await new Promise((r) => setTimeout(r, 300));
  }
}
