import 'server-only';

// Sequelize wraps the driver's error as `parent` (also `original`); the errno, SQLSTATE and the
// driver's `fatal` flag that tell what happened live on that cause.
export interface DriverCause {
  errno?: number;
  sqlState?: string;
  fatal?: boolean;
}

export function driverCause(err: unknown): DriverCause | null {
  const e = err as { parent?: unknown; original?: unknown } | null;
  const cause = e?.parent ?? e?.original ?? err;
  return typeof cause === 'object' && cause !== null ? (cause as DriverCause) : null;
}
