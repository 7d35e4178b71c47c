// Runs pending migrations against the database named by the environment (npm start and npm test call it).
import { getDb } from '../server/db';
import { migrateUp } from '../models/migrate';

async function main(): Promise<void> {
  const db = getDb();
  const done = await migrateUp(db);
  console.log(done.length ? `migrated: ${done.join(', ')}` : 'schema up to date');
  await db.close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
