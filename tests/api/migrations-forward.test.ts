import type { QueryInterface } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { Bin, CountEvent, initModels, MailMessage, Part, PrintJob, RequestKey, Scale, SiteSettings, User, UserSession } from '../../models';
import { HIDDEN_SECRET } from '../../server/mail/mask-secrets';
import { createMigrator, migrateUp } from '../../models/migrate';
import { migrations } from '../../models/migrations';
import { createScratchDatabase, schemaShape } from '../helpers/scratch-database';

// Rows a shop would have had when each migration was the newest, written with that era's columns
// only (raw rows, not today's models). A new migration must add its own era here.
const now = new Date('2026-03-02T08:00:00Z');
const stamps = { created_at: now, updated_at: now };
const ERA_ROWS: Record<string, (q: QueryInterface) => Promise<void>> = {
  '0001-foundation': async (q) => {
    await q.bulkInsert('users', [
      { id: 901, email: 'old.hand@upgrade.test', name: 'Old Hand', role: 'operator', password_hash: null, active: true, version: 3, ...stamps },
    ]);
    await q.bulkInsert('mail_messages', [
      {
        id: 901,
        kind: 'invitation',
        to_address: 'old.hand@upgrade.test',
        subject: 'Welcome',
        body_text: 'Hello',
        status: 'sent',
        error: null,
        sent_at: now,
        ...stamps,
      },
    ]);
  },
  '0002-counting-core': async (q) => {
    await q.bulkInsert('scales', [
      {
        id: 901,
        name: 'Upgrade bench',
        location: 'Line 1',
        capacity_g: 3000,
        min_load_g: 2,
        division_g: 0.1,
        verification_interval_g: 0.1,
        accuracy_class: 'III',
        repeatability_g: null,
        connection: JSON.stringify({ kind: 'simulator' }),
        status: 'in_service',
        status_reason: null,
        calibration_due_at: '2027-01-31',
        version: 0,
        ...stamps,
      },
    ]);
    await q.bulkInsert('containers', [{ id: 901, name: 'Blue tray', kind: 'tray', tare_g: 112.4, version: 0, ...stamps }]);
    await q.bulkInsert('parts', [
      {
        id: 901,
        part_number: 'UPG-M3-8',
        description: 'Screw M3×8',
        counting_method: 'scale',
        apw_g: 0.52,
        apw_sample_size: 25,
        piece_spread: 0.015,
        spread_observations: 4,
        photo_file: null,
        version: 1,
        ...stamps,
      },
    ]);
    await q.bulkInsert('count_events', [
      {
        id: 901,
        idempotency_key: 'upgrade-901',
        request_hash: 'a'.repeat(64),
        purpose: 'part',
        part_id: 901,
        scale_id: 901,
        container_id: 901,
        gross_g: 174.8,
        tare_g: 112.4,
        net_g: 62.4,
        sample_quantity: 25,
        sample_net_g: 13,
        sample_on_pan: true,
        apw_g: 0.52,
        piece_spread: 0.015,
        count_raw: 120,
        count: 120,
        standard_uncertainty: 0.4,
        expanded_uncertainty: 0.8,
        exact: true,
        target_quantity: 120,
        warnings: '[]',
        operator_id: 901,
        ...stamps,
      },
    ]);
  },
  '0003-kits-orders-stock': async (q) => {
    await q.bulkInsert('bins', [
      { id: 901, code: 'UP-01-1-01', part_id: 901, container_id: null, book_quantity: 480, abc_class: 'B', last_counted_at: null, version: 0, ...stamps },
    ]);
    await q.bulkInsert('part_stock', [{ part_id: 901, on_hand: 480, reserved: 0 }]);
    await q.bulkInsert('stock_movements', [
      {
        id: 901,
        part_id: 901,
        bin_id: 901,
        delta: 480,
        reason: 'initial',
        ref_type: null,
        ref_id: null,
        note: 'opening stock',
        created_by: 901,
        created_at: now,
      },
    ]);
    await q.bulkInsert('kits', [{ id: 901, code: 'UPG-KIT', revision: 'A', description: 'Upgrade kit', active: true, version: 0, ...stamps }]);
    await q.bulkInsert('kit_components', [{ id: 901, kit_id: 901, part_id: 901, quantity: 8, tolerance_below: 0, tolerance_above: 1 }]);
    await q.bulkInsert('build_orders', [
      {
        id: 901,
        number: 'BO-UPG-00001',
        kit_id: 901,
        quantity: 10,
        due_date: '2026-04-01',
        status: 'draft',
        created_by: 901,
        released_at: null,
        completed_at: null,
        cancelled_at: null,
        override_reason: null,
        version: 0,
        ...stamps,
      },
    ]);
    await q.bulkInsert('build_order_lines', [
      {
        id: 901,
        order_id: 901,
        part_id: 901,
        quantity_per_kit: 8,
        required: 80,
        tolerance_below: 0,
        tolerance_above: 10,
        counted: 0,
        variance_sum: 0,
        captures: 0,
        verdict: 'open',
        ...stamps,
      },
    ]);
  },
  '0004-quality': async (q) => {
    await q.bulkInsert('test_weights', [
      {
        id: 901,
        identifier: 'UPG-W-1KG',
        nominal_g: 1000,
        weight_class: 'F1',
        certificate_number: 'C-1',
        certificate_file: null,
        due_at: '2027-06-30',
        active: true,
        version: 0,
        ...stamps,
      },
    ]);
    await q.bulkInsert('job_runs', [{ job: 'calibration-reminder', run_key: 'soon:901:2027-01-31', created_at: now }]);
  },
  '0005-bin-counts': async (q) => {
    await q.bulkInsert('bin_counts', [
      {
        id: 901,
        bin_id: 901,
        count_event_id: 901,
        book_quantity: 480,
        counted: 478,
        variance: -2,
        status: 'pending',
        decided_by: null,
        decided_at: null,
        note: null,
        ...stamps,
      },
    ]);
  },
  '0006-print-jobs': async (q) => {
    await q.bulkInsert('print_jobs', [
      {
        id: 901,
        batch_id: '00000000-0000-4000-8000-000000000901',
        batch_index: 0,
        batch_count: 1,
        template: 'bin',
        stock: '50x25',
        item_ids: '[901]',
        labels: 1,
        printer_url: 'ipp://127.0.0.1:631/printers/bench',
        status: 'sent',
        pages: 1,
        bytes: 900,
        printer_job_id: 7,
        error: null,
        requested_by: 901,
        sent_at: now,
        ...stamps,
      },
    ]);
  },
  '0007-exact-counts': async (q) => {
    await q.bulkInsert('piece_weight_samples', [
      {
        id: 901,
        part_id: 901,
        scale_id: 901,
        quantity: 25,
        net_weight_g: 13.1,
        apw_g: 0.524,
        increments_g: null,
        created_by: 901,
        status: 'held',
        hold_reason: 'far from history',
        net_variance_g2: 0.0025,
        decided_by: null,
        decided_at: null,
        ...stamps,
      },
    ]);
    await q.bulkUpdate('parts', { spread_scatter: 0.0004, spread_noise: 0.00001, spread_dof: 24 }, { id: 901 });
  },
  '0008-site-time-zone': async (q) => {
    await q.bulkUpdate('site_settings', { time_zone: 'Europe/Vienna' }, { id: 1 });
  },
  '0009-user-sessions': async (q) => {
    await q.bulkInsert('user_sessions', [
      { id: 901, token_hash: 'a'.repeat(64), user_id: 901, last_seen_at: now, expires_at: now, ended_at: now, end_reason: 'signed_out', ...stamps },
    ]);
    await q.bulkUpdate('site_settings', { session_hours: 10, four_eyes_variances: false }, { id: 1 });
    // Logged in full, as the outbox did then: the next migration masks it.
    await q.bulkInsert('mail_messages', [
      {
        id: 902,
        kind: 'invitation',
        to_address: 'old.hand@upgrade.test',
        subject: 'You are invited',
        body_text: 'Choose:\n\nhttp://127.0.0.1:3000/set-password?token=Ab_c-9\n\nThanks',
        status: 'sent',
        error: null,
        sent_at: now,
        ...stamps,
      },
    ]);
  },
  '0010-mask-mail-links': async (q) => {
    await q.bulkInsert('mail_messages', [
      {
        id: 903,
        kind: 'password_reset',
        to_address: 'old.hand@upgrade.test',
        subject: 'Choose a new password',
        body_text: 'Masked when sent: [one-time link: only the recipient has it]',
        status: 'sent',
        error: null,
        sent_at: now,
        ...stamps,
      },
    ]);
  },
  '0011-request-keys': async (q) => {
    await q.bulkInsert('request_keys', [
      { id: 901, user_id: 901, scope: 'orders.create', idem_key: 'upgrade-key-901', fingerprint: 'b'.repeat(64), record_id: 901, created_at: now },
    ]);
  },
  '0012-print-job-notes': async (q) => {
    await q.bulkInsert('print_jobs', [
      {
        id: 902,
        batch_id: '00000000-0000-4000-8000-000000000902',
        batch_index: 0,
        batch_count: 1,
        template: 'part',
        stock: '2x1in',
        item_ids: '[901]',
        labels: 1,
        printer_url: 'ipp://127.0.0.1:631/printers/bench',
        status: 'sent',
        pages: 1,
        bytes: 900,
        printer_job_id: 8,
        error: null,
        note: 'Printed as "?": 漢 (U+6F22).',
        requested_by: 901,
        sent_at: now,
        ...stamps,
      },
    ]);
  },
};

describe('migrations on an existing database with data', () => {
  const scratch: Array<() => Promise<void>> = [];
  afterAll(async () => {
    for (const drop of scratch) await drop();
  });

  it('has rows of its era for every migration, so a new one cannot skip this check', () => {
    expect(Object.keys(ERA_ROWS)).toEqual(migrations.map((m) => m.name));
  });

  it('runs forward one release at a time with data in every table, keeps every row, and ends where a fresh database ends', { timeout: 120_000 }, async () => {
    const upgraded = await createScratchDatabase('upgrade');
    scratch.push(upgraded.drop);
    const q = upgraded.db.getQueryInterface();
    const migrator = createMigrator(upgraded.db);
    for (const m of migrations) {
      await migrator.up({ to: m.name });
      await ERA_ROWS[m.name](q);
    }
    // Nothing is pending, and running again (as every start does) changes nothing.
    expect(await migrateUp(upgraded.db)).toEqual([]);

    const fresh = await createScratchDatabase('fresh');
    scratch.push(fresh.drop);
    expect(await migrateUp(fresh.db)).toEqual(migrations.map((m) => m.name));
    expect(await schemaShape(upgraded.name)).toEqual(await schemaShape(fresh.name));

    // Today's models read the old rows, and write new ones beside them.
    initModels(upgraded.db);
    const old = await CountEvent.findByPk(901);
    expect(old).toMatchObject({ count: 120, exact: true, orderLineId: null, binId: null, operatorId: 901 });
    expect(Number(old!.netG)).toBe(62.4);
    expect(await User.findByPk(901)).toMatchObject({ email: 'old.hand@upgrade.test', version: 3 });
    expect(await Part.findByPk(901)).toMatchObject({ partNumber: 'UPG-M3-8', spreadObservations: 4 });
    expect(await Scale.findByPk(901)).toMatchObject({ name: 'Upgrade bench', calibrationDueAt: '2027-01-31' });
    expect(await Bin.findByPk(901)).toMatchObject({ bookQuantity: 480, abcClass: 'B' });
    expect(await PrintJob.findByPk(901)).toMatchObject({ status: 'sent', labels: 1, note: null });
    expect(await PrintJob.findByPk(902)).toMatchObject({ note: 'Printed as "?": 漢 (U+6F22).' });
    expect(await SiteSettings.findByPk(1)).toMatchObject({ timeZone: 'Europe/Vienna', sessionHours: 10, fourEyesVariances: false });
    expect(await UserSession.findByPk(901)).toMatchObject({ userId: 901, endReason: 'signed_out' });
    expect(await RequestKey.findByPk(901)).toMatchObject({ scope: 'orders.create', recordId: 901 });
    expect((await MailMessage.findByPk(902))!.bodyText).toBe(`Choose:\n\n${HIDDEN_SECRET}\n\nThanks`);
    expect((await MailMessage.findByPk(901))!.bodyText).toBe('Hello');
    const bin = (await Bin.findByPk(901))!;
    bin.bookQuantity = 478;
    await bin.save();
    expect(bin.version).toBe(1);
    const [[totals]] = (await upgraded.db.query(
      'SELECT (SELECT COUNT(*) FROM count_events) e, (SELECT COUNT(*) FROM bin_counts) b, (SELECT COUNT(*) FROM job_runs) j',
    )) as [[{ e: number; b: number; j: number }], unknown];
    expect(totals).toEqual({ e: 1, b: 1, j: 1 });
  });
});
