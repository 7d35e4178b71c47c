// Starts the database floor (primary-key-server.ts) in a process of its own and waits until it answers.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { freePort } from '../next-start';

export async function startPrimaryKeyServer(partId: number): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(
    path.join(__dirname, '../../node_modules/.bin/tsx'),
    ['--conditions=react-server', path.join(__dirname, 'primary-key-server.ts'), String(port), String(partId)],
    { stdio: ['ignore', 'inherit', 'inherit'] },
  );
  for (let i = 0; i < 100; i++) {
    if (child.exitCode !== null) throw new Error('the primary-key server exited early');
    try {
      if ((await fetch(url)).ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  child.kill('SIGKILL');
  throw new Error('the primary-key server did not answer in time');
}
