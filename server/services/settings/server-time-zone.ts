import 'server-only';

// The zone the server runs in (TZ, else the system's), used until the site sets its own.
export function serverTimeZone(): string {
  return process.env.TZ || Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}
