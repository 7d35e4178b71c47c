// npm run create-admin -- --email you@example.com --name "Your Name"
// Prints a one-time link that sets the administrator's password (see server/services/users/create-admin.ts).
import { parseArgs } from 'node:util';
import { getDb } from '../server/db';
import { AppError } from '../server/errors';
import { createAdmin } from '../server/services/users/create-admin';

async function main(): Promise<void> {
  const { values } = parseArgs({ options: { email: { type: 'string' }, name: { type: 'string' } } });
  try {
    const result = await createAdmin({ email: values.email ?? '', name: values.name ?? '' });
    console.log(
      [
        result.created ? `Created administrator ${result.email}.` : `${result.email} is already an administrator: here is a fresh link.`,
        'Open this link to choose the password (it works once, until ' + result.expiresAt.toISOString().slice(0, 16).replace('T', ' ') + ' UTC):',
        `  ${result.link}`,
        'Keep it to yourself: whoever opens it first becomes this administrator.',
      ].join('\n'),
    );
  } catch (err) {
    if (!(err instanceof AppError)) throw err;
    const fields = Object.entries(err.fields ?? {}).map(([f, m]) => `  --${f}: ${m}`);
    console.error([err.message, ...fields].join('\n'));
    process.exitCode = 1;
  } finally {
    await getDb().close();
  }
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
