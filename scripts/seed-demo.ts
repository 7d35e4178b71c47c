// npm start: loads the Corvel Motion Works demo into an empty database.
import { DEFAULT_DEMO_PASSWORD } from '../lib/demo-accounts';
import { getDb } from '../server/db';
import { seedDemoData } from './demo/seed-demo-data';

async function main(): Promise<void> {
  const outcome = await seedDemoData(process.env.DEMO_PASSWORD || DEFAULT_DEMO_PASSWORD);
  console.log(
    outcome === 'loaded'
      ? 'demo: loaded Corvel Motion Works (scales, parts, bins, kits, orders, calibration records, a finished count audit)'
      : 'demo: database already has users, leaving it as it is',
  );
  await getDb().close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
