// One production app server (scripts/serve.ts, as `npm start` runs it) on a free loopback port, for the API and browser tests and for the load
// bench. The caller has already migrated and built; it passes the environment the app should see.
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';

const root = path.resolve(__dirname, '..');

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

// The app's own log goes to `logDir`/app-PORT.log for reading after a failure.
export async function startApp(env: Record<string, string>, logDir: string): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/serve.ts'], {
    cwd: root,
    env: { ...process.env, APP_URL: url, HOST: '127.0.0.1', ...env, PORT: String(port) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  // Never outlive the process that started it, even when that one ends without cleaning up
  // (a timed-out test, a failed bench).
  const reap = () => child.kill('SIGKILL');
  process.once('exit', reap);
  child.once('exit', () => process.off('exit', reap));
  mkdirSync(path.join(root, logDir), { recursive: true });
  const log = createWriteStream(path.join(root, logDir, `app-${port}.log`));
  let output = '';
  const keep = (d: Buffer) => {
    log.write(d);
    if (output.length < 20_000) output += d;
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  for (let i = 0; i < 200; i++) {
    if (child.exitCode !== null) throw new Error(`the app server exited early:\n${output}`);
    try {
      const res = await fetch(`${url}/api/v1/health`);
      if (res.ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  child.kill('SIGKILL');
  throw new Error(`the app server did not answer in time:\n${output}`);
}
