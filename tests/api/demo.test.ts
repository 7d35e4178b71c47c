import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Audit, AuditItem, BinCount, BuildOrder, CountEvent, MailMessage, Part, PieceWeightSample, Scale, User } from '../../models';
import { migrateUp } from '../../models/migrate';
import { seedDemoData } from '../../scripts/demo/seed-demo-data';
import { getDb } from '../../server/db';
import { accuracyReport } from '../../server/services/audits/accuracy-report';
import { createScratchDatabase } from '../helpers/scratch-database';

// The demo is what a prospective shop sees first: load it the way `npm start` does, into its own
// database, and check the story it tells still holds.
describe('the demo (Corvel Motion Works)', () => {
  let drop: () => Promise<void>;
  let seededOn: string;
  beforeAll(async () => {
    const scratch = await createScratchDatabase('demo');
    drop = scratch.drop;
    await migrateUp(scratch.db);
    await scratch.db.close();
    // The app's own connection (server/db) reads DB_NAME when first used: point it here first.
    process.env.DB_NAME = scratch.name;
    seededOn = new Date().toISOString().slice(0, 10);
    expect(await seedDemoData('demo-test-password')).toBe('loaded');
  }, 180_000);
  afterAll(async () => {
    await getDb().close();
    await drop?.();
  });

  it('has one person per role, and loads only into an empty database', async () => {
    expect((await User.findAll()).map((u) => u.role).sort()).toEqual(['admin', 'clerk', 'operator', 'planner', 'quality']);
    expect(await seedDemoData('demo-test-password')).toBe('skipped');
  });

  it('holds one sample for review: an O-ring of the wrong size that teaches its part nothing', async () => {
    const held = await PieceWeightSample.findAll({ where: { status: 'held' } });
    expect(held).toHaveLength(1);
    const part = (await Part.findByPk(held[0].partId))!;
    expect(part.partNumber).toBe('CMW-ORG-6X1');
    expect(Number(part.apwG)).toBeLessThan(0.07);
  });

  it('shows an order being kitted, one waiting, and one held back by a shortage', async () => {
    const orders = await BuildOrder.findAll({ order: [['number', 'ASC']] });
    // Order numbers carry the year they were created in.
    const year = orders[0].createdAt.getUTCFullYear();
    expect(orders.map((o) => [o.number, o.status])).toEqual([
      [`BO-${year}-00001`, 'in_progress'],
      [`BO-${year}-00002`, 'draft'],
      [`BO-${year}-00003`, 'draft'],
    ]);
    expect(await CountEvent.count({ where: { purpose: 'kit_line' } })).toBe(2);
  });

  it('has a scale locked out by its failed test, the rest in service', async () => {
    const scales = await Scale.findAll();
    expect(scales.filter((s) => s.status === 'locked').map((s) => s.name)).toEqual([expect.stringContaining('serial')]);
    expect(scales.filter((s) => s.status === 'in_service').length).toBeGreaterThanOrEqual(2);
  });

  it("has the clerk's short recount of a bin waiting for a decision, and its notice in the outbox", async () => {
    const [waiting] = await BinCount.findAll({ where: { status: 'pending' } });
    expect(waiting.variance).toBeLessThan(-100);
    expect(await MailMessage.count({ where: { kind: 'variance_pending' } })).toBe(1);
  });

  it('has a finished count audit whose recounts fill the accuracy report', async () => {
    const [audit] = await Audit.findAll();
    expect(audit).toMatchObject({ status: 'closed', lotSize: 30 });
    expect(await AuditItem.count({ where: { auditId: audit.id, handCount: null } })).toBe(0);
    const rows = await accuracyReport({ from: seededOn, to: new Date().toISOString().slice(0, 10), by: 'part' });
    expect(rows.reduce((n, r) => n + r.recounts, 0)).toBe(audit.sampleSize);
  });
});
