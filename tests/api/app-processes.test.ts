// APP_PROCESSES: several app processes serving one port, kept running, and stopped together.
import { execFileSync } from 'node:child_process';
import { once } from 'node:events';
import { describe, expect, it } from 'vitest';
import { startAnotherApp } from '../helpers/app-process';
import { signedIn } from '../helpers/http';

function childPids(pid: number): number[] {
  try {
    return execFileSync('pgrep', ['-P', String(pid)])
      .toString()
      .trim()
      .split('\n')
      .filter(Boolean)
      .map(Number);
  } catch {
    return []; // pgrep exits 1 when there are none
  }
}

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

describe('several app processes', () => {
  it('serves one port from two processes, starts again one that dies, and stops both on SIGTERM', { timeout: 90_000 }, async () => {
    const app = await startAnotherApp({ APP_PROCESSES: '2' });
    try {
      const primary = app.child.pid!;
      await expect.poll(() => childPids(primary).length, { timeout: 30_000 }).toBe(2);
      // A session made through one process is good in the other: every request here is a new connection.
      const planner = await signedIn('planner', app.url);
      for (let i = 0; i < 6; i += 1) expect((await planner.agent.get('/api/v1/session').set('Connection', 'close')).status).toBe(200);

      const [victim, survivor] = childPids(primary);
      process.kill(victim, 'SIGKILL');
      // A connection handed to the killed process before the primary heard of its end is lost (reset, or
      // never answered), as any crash loses its connections; from then on the other one serves alone.
      const live = () =>
        fetch(`${app.url}/api/v1/health/live`, { headers: { connection: 'close' }, signal: AbortSignal.timeout(5_000) }).then(
          (r) => r.status,
          () => 'lost',
        );
      await expect.poll(live, { timeout: 10_000 }).toBe(200);
      await expect.poll(() => childPids(primary).filter((p) => p !== survivor && p !== victim).length, { timeout: 30_000 }).toBe(1);

      const exited = once(app.child, 'exit');
      const workers = childPids(primary);
      app.child.kill('SIGTERM');
      const [code, signal] = await exited;
      expect(code === 143 || signal === 'SIGTERM').toBe(true);
      expect(workers.filter(alive)).toEqual([]);
    } finally {
      for (const pid of childPids(app.child.pid!)) process.kill(pid, 'SIGKILL');
      app.child.kill('SIGKILL');
    }
  });

  it('refuses a setting it cannot read, saying what it takes', async () => {
    await expect(startAnotherApp({ APP_PROCESSES: 'two' })).rejects.toThrow(/APP_PROCESSES is a whole number from 1 to 64, or auto/);
  });
});
