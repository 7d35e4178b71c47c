import 'server-only';
import { DEFAULT_DEMO_PASSWORD, DEMO_EMAILS, isLoopbackHost } from '@/lib/demo-accounts';
import { User } from '@/models';
import { getDb } from '../db';
import { verifyPassword } from './passwords';

/** The demo's active accounts that anyone who read the README can still sign in to. */
async function demoAccountsOnKnownPassword(): Promise<string[]> {
  getDb();
  const known = [...new Set([DEFAULT_DEMO_PASSWORD, process.env.DEMO_PASSWORD].filter((p): p is string => Boolean(p)))];
  const users = await User.findAll({ where: { email: DEMO_EMAILS as string[], active: true } });
  const open: string[] = [];
  for (const u of users) {
    for (const password of known) {
      if (await verifyPassword(password, u.passwordHash)) {
        open.push(u.email);
        break;
      }
    }
  }
  return open;
}

/**
 * Refuses to serve beyond this machine while a demo account keeps its documented password: on a shop
 * network that is an administrator sign-in anyone can look up.
 */
export async function assertSafeToServe(host: string): Promise<void> {
  if (isLoopbackHost(host)) return;
  const open = await demoAccountsOnKnownPassword();
  if (!open.length) return;
  throw new Error(
    [
      `Refusing to serve on ${host}: these demo accounts still have the demo password: ${open.join(', ')}.`,
      'Fix one of these ways, then start again:',
      '  - serve on this machine only (leave HOST unset, or HOST=127.0.0.1);',
      '  - or give each a password of its own (sign in, People → Reset password), or switch them off on People;',
      '  - or start without the demo: a fresh database with DEMO=0, then `npm run create-admin -- --email you@example.com --name "Your Name"`.',
    ].join('\n'),
  );
}
