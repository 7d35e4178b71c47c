// Loads the demo into an empty database only; a database that already has users is left alone.
import { SiteSettings, User } from '../models';
import { hashPassword } from '../server/auth/passwords';
import { getDb } from '../server/db';
import { DEMO_SITE_NAME, DEMO_USERS, demoEmail } from './demo/demo-company';
import { loadDemo } from './demo/load-demo';

async function main(): Promise<void> {
  const db = getDb();
  if ((await User.count()) > 0) {
    console.log('demo: database already has users, leaving it as it is');
    await db.close();
    return;
  }
  const password = process.env.DEMO_PASSWORD || 'tallyforge-demo';
  const passwordHash = await hashPassword(password);
  const users = await db.transaction(async (transaction) => {
    await SiteSettings.update({ siteName: DEMO_SITE_NAME }, { where: { id: 1 }, transaction });
    return User.bulkCreate(DEMO_USERS.map((u) => ({ email: demoEmail(u.role), name: u.name, role: u.role, passwordHash })), { transaction });
  });
  const people = Object.fromEntries(users.map((u) => [u.role, { id: u.id, email: u.email, name: u.name, role: u.role }])) as Parameters<typeof loadDemo>[0];
  await loadDemo(people);
  console.log('demo: loaded Corvel Motion Works (scales, parts, bins, kits, orders, calibration records)');
  await db.close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
