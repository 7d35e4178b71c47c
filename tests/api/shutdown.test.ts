import { once } from 'node:events';
import http from 'node:http';
import { describe, expect, it } from 'vitest';
import { PartStock } from '../../models';
import { startAnotherApp } from '../helpers/app-process';
import { holdRowLocks, waitForLockWaits } from '../helpers/database-faults';
import { testDb } from '../helpers/db';
import { signedIn } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';

function probeNewConnection(url: string): Promise<'answered' | 'refused'> {
  return new Promise((resolve) => {
    const req = http.get(url, { agent: false }, (res) => {
      res.resume();
      resolve('answered');
    });
    req.on('error', () => resolve('refused'));
  });
}

describe('graceful shutdown', () => {
  it('on SIGTERM stops taking new requests, finishes the release in flight, and exits', { timeout: 60_000 }, async () => {
    const app = await startAnotherApp();
    try {
      const planner = await signedIn('planner', app.url);
      const { order } = await releasedOrder(planner.agent, { status: 'draft' });
      const partId = order.lines[0].partId as number;
      testDb();
      const before = (await PartStock.findByPk(partId))!;

      // The release waits halfway in on a stock row held here while the app is told to stop.
      const locks = await holdRowLocks([{ sql: 'SELECT * FROM part_stock WHERE part_id = ?', values: [partId] }]);
      const release = planner.agent
        .post(`/api/v1/orders/${order.id}/release`)
        .send({ version: order.version })
        .then((r) => r);
      await waitForLockWaits(1);
      const exited = once(app.child, 'exit');
      app.child.kill('SIGTERM');
      // A new connection is refused once the listener has closed. Each probe opens its own connection:
      // fetch would reuse a kept-alive one from an earlier probe, which the closing server still serves.
      await expect.poll(() => probeNewConnection(`${app.url}/api/v1/health`), { timeout: 10_000 }).toBe('refused');
      expect(app.child.exitCode).toBeNull();

      await locks.release();
      const res = await release;
      expect(res.status).toBe(200);
      expect(res.body.order.status).toBe('released');
      const [code, signal] = await exited;
      expect(code === 143 || signal === 'SIGTERM').toBe(true);
      expect(await PartStock.findByPk(partId)).toMatchObject({ reserved: before.reserved + order.lines[0].required });
    } finally {
      app.child.kill('SIGKILL');
    }
  });
});
