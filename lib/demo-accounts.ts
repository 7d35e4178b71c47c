// The demo's sign-ins: one person per role at a domain reserved for tests (RFC 2606's .test).
import { ROLES, type Role } from './roles';

export const DEFAULT_DEMO_PASSWORD = 'tallyforge-demo';

export const demoEmail = (role: Role): string => `${role}@tallyforge.test`;

export const DEMO_EMAILS: readonly string[] = ROLES.map(demoEmail);

/** Addresses that only this machine can reach: serving there, the demo's known passwords harm no one. */
export function isLoopbackHost(host: string): boolean {
  const h = host
    .trim()
    .toLowerCase()
    .replace(/^\[|\]$/g, '');
  return h === 'localhost' || h === '::1' || /^127(\.\d{1,3}){3}$/.test(h);
}
