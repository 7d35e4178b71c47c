// Loads the demo into an empty database only; a database that already has users is left alone.
import { SiteSettings, User } from '../../models';
import { hashPassword } from '../../server/auth/passwords';
import { getDb } from '../../server/db';
import { demoEmail } from '../../lib/demo-accounts';
import { DEMO_SITE_NAME, DEMO_USERS } from './demo-company';
import { loadDemo } from './load-demo';

export async function seedDemoData(password: string): Promise<'loaded' | 'skipped'> {
  const db = getDb();
  if ((await User.count()) > 0) return 'skipped';
  const passwordHash = await hashPassword(password);
  const users = await db.transaction(async (transaction) => {
    await SiteSettings.update({ siteName: DEMO_SITE_NAME }, { where: { id: 1 }, transaction });
    return User.bulkCreate(
      DEMO_USERS.map((u) => ({ email: demoEmail(u.role), name: u.name, role: u.role, passwordHash })),
      { transaction },
    );
  });
  const people = Object.fromEntries(users.map((u) => [u.role, { id: u.id, email: u.email, name: u.name, role: u.role }])) as Parameters<typeof loadDemo>[0];
  await loadDemo(people);
  return 'loaded';
}
