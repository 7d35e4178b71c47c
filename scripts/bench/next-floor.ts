// Builds and starts the framework floor (scripts/bench/next-floor/: one JSON route handler on the app's
// own Next.js version) with `next start`, in a copy under .data/bench/ so its build stays out of the source tree.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { cpSync, mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { freePort } from '../next-start';

const root = path.resolve(__dirname, '../..');
const NEXT = path.join(root, 'node_modules/.bin/next');

export async function startNextFloor(): Promise<{ url: string; child: ChildProcess }> {
  const dir = path.join(root, '.data/bench/next-floor');
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  cpSync(path.join(__dirname, 'next-floor'), dir, { recursive: true });
  const built = spawnSync(NEXT, ['build', dir], { cwd: root, encoding: 'utf8', env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' } });
  if (built.status !== 0) throw new Error(`the floor app did not build:\n${built.stdout}\n${built.stderr}`);
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(NEXT, ['start', dir, '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' },
  });
  const reap = () => child.kill('SIGKILL');
  process.once('exit', reap);
  child.once('exit', () => process.off('exit', reap));
  for (let i = 0; i < 200; i++) {
    if (child.exitCode !== null) throw new Error('the floor app exited early');
    try {
      if ((await fetch(`${url}/api/floor`)).ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  child.kill('SIGKILL');
  throw new Error('the floor app did not answer in time');
}
