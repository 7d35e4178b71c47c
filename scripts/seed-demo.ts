// Loads the demo into an empty database only; a database that already has users is left alone.
import { SiteSettings, User } from '../models';
import { hashPassword } from '../server/auth/passwords';
import { getDb } from '../server/db';
import { DEMO_SITE_NAME, DEMO_USERS, demoEmail } from './demo/demo-company';

async function main(): Promise<void> {
  const db = getDb();
  if ((await User.count()) > 0) {
    console.log('demo: database already has users, leaving it as it is');
    await db.close();
    return;
  }
  const password = process.env.DEMO_PASSWORD || 'tallyforge-demo';
  const passwordHash = await hashPassword(password);
  await db.transaction(async (transaction) => {
    await User.bulkCreate(DEMO_USERS.map((u) => ({ email: demoEmail(u.role), name: u.name, role: u.role, passwordHash })), { transaction });
    await SiteSettings.update({ siteName: DEMO_SITE_NAME }, { where: { id: 1 }, transaction });
  });
  console.log('demo: loaded Corvel Motion Works');
  await db.close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
