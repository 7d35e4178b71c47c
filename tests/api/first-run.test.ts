import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import bcrypt from 'bcryptjs';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_DEMO_PASSWORD, demoEmail } from '../../lib/demo-accounts';
import { migrateUp } from '../../models/migrate';
import { startAnotherApp } from '../helpers/app-process';
import { createUser, TEST_PASSWORD, unique } from '../helpers/db';
import { anonymous } from '../helpers/http';
import { createScratchDatabase } from '../helpers/scratch-database';

const run = promisify(execFile);
const root = path.resolve(__dirname, '../..');

// What `npm run create-admin` runs, against the test database, with the arguments given.
function createAdminCommand(args: string[]) {
  return run(path.join(root, 'node_modules/.bin/tsx'), ['--conditions=react-server', 'scripts/create-admin.ts', ...args], {
    cwd: root,
    env: { ...process.env, APP_URL: 'http://tallyforge.example' },
  }).then(
    (r) => ({ code: 0, out: r.stdout, err: r.stderr }),
    (e: { code: number; stdout: string; stderr: string }) => ({ code: e.code, out: e.stdout, err: e.stderr }),
  );
}

const tokenOf = (out: string) => /set-password\?token=([\w-]+)/.exec(out)?.[1];

describe('first run beyond this machine', () => {
  let scratch: Awaited<ReturnType<typeof createScratchDatabase>>;
  beforeAll(async () => {
    scratch = await createScratchDatabase('firstrun');
    await migrateUp(scratch.db);
    const hash = await bcrypt.hash(DEFAULT_DEMO_PASSWORD, 4);
    await scratch.db.query(
      `INSERT INTO users (email, name, role, password_hash, active, version, created_at, updated_at)
       VALUES (?, 'Demo admin', 'admin', ?, 1, 0, UTC_TIMESTAMP(), UTC_TIMESTAMP())`,
      { replacements: [demoEmail('admin'), hash] },
    );
  }, 120_000);
  afterAll(() => scratch?.drop());

  it('refuses to serve on a network address while a demo account keeps the demo password, and says how to fix it', { timeout: 90_000 }, async () => {
    const refused = startAnotherApp({ DB_NAME: scratch.name, HOST: '0.0.0.0' });
    await expect(refused).rejects.toThrow(/Refusing to serve on 0\.0\.0\.0: these demo accounts still have the demo password: admin@tallyforge\.test/);
    await expect(refused).rejects.toThrow(/npm run create-admin/);

    // The same database on loopback serves: only this machine can reach it.
    const local = await startAnotherApp({ DB_NAME: scratch.name });
    local.child.kill('SIGKILL');

    // Given a password of its own, the demo account no longer stops it.
    await scratch.db.query('UPDATE users SET password_hash = ? WHERE email = ?', {
      replacements: [await bcrypt.hash('a password of the shop', 4), demoEmail('admin')],
      type: QueryTypes.UPDATE,
    });
    const open = await startAnotherApp({ DB_NAME: scratch.name, HOST: '0.0.0.0' });
    open.child.kill('SIGKILL');
  });
});

describe('npm run create-admin', () => {
  it('creates an administrator and prints a one-time link that sets the password and signs them in', { timeout: 60_000 }, async () => {
    const email = `${unique('first-admin')}@example.test`;
    const made = await createAdminCommand(['--email', email, '--name', 'Ada First']);
    expect(made.code).toBe(0);
    expect(made.out).toContain(`Created administrator ${email}`);
    expect(made.out).toContain('http://tallyforge.example/set-password?token=');
    const token = tokenOf(made.out)!;

    const agent = anonymous();
    const accepted = await agent.post('/api/v1/invitations/accept').send({ token, password: 'chosen at the console 1' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, role: 'admin' });

    // Run again for the same administrator: a fresh link; the used one stays used.
    const again = await createAdminCommand(['--email', email, '--name', 'Ada First']);
    expect(again.code).toBe(0);
    expect(again.out).toContain('already an administrator');
    expect(tokenOf(again.out)).not.toBe(token);
  });

  it('refuses an e-mail that belongs to someone who is not an administrator, and a bad e-mail, saying why', { timeout: 60_000 }, async () => {
    const clerk = await createUser('clerk');
    const taken = await createAdminCommand(['--email', clerk.email, '--name', 'Someone']);
    expect(taken.code).toBe(1);
    expect(taken.err).toMatch(/already has an account \(clerk\)/);
    // The clerk's own password still works: nothing was changed.
    expect((await anonymous().post('/api/v1/session').send({ email: clerk.email, password: TEST_PASSWORD })).status).toBe(200);

    const bad = await createAdminCommand(['--email', 'not-an-address', '--name', '']);
    expect(bad.code).toBe(1);
    expect(bad.err).toMatch(/--email: /);
    expect(bad.err).toMatch(/--name: /);
  });
});
