import 'server-only';
import { UniqueConstraintError, OptimisticLockError, ConnectionError, DatabaseError, ValidationError, ForeignKeyConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import { driverCause } from '../db-error-cause';
import { AppError } from '../errors';
import { log } from '../log';
import { zodFields } from './zod-fields';

export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}

// Maps any thrown value to the JSON error shape. Unknown errors become a generic 500:
// no stack traces or SQL ever reach the body.
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return new AppError('validation_failed', 'Some fields need attention', { fields: zodFields(err) });
  if (err instanceof UniqueConstraintError) {
    const fields = Object.fromEntries((err.errors ?? []).map((e) => [e.path ?? 'value', 'is already taken']));
    return new AppError('duplicate', 'A record with that value already exists', { fields });
  }
  if (err instanceof OptimisticLockError) return new AppError('stale_version', 'Someone else changed this record; reload and try again');
  if (err instanceof ForeignKeyConstraintError) return new AppError('conflict', 'A related record is missing or still in use');
  // A number beyond its DECIMAL or INT column (ER_WARN_DATA_OUT_OF_RANGE), given or derived from what was
  // given (grams from kilograms, a piece weight from a sample): the request cannot be stored, and the
  // service's transaction rolls back, so it is the caller's 400 rather than our 500.
  if (err instanceof DatabaseError && driverCause(err)?.errno === 1264) {
    return new AppError('validation_failed', 'A number is too large to store', { fields: { _: 'a number is out of the range that can be stored' } });
  }
  if (err instanceof ValidationError) {
    const fields = Object.fromEntries(err.errors.map((e) => [e.path ?? 'value', e.message]));
    return new AppError('validation_failed', 'Some fields need attention', { fields });
  }
  // Pure code in lib/ refuses out-of-range input with a RangeError naming the field ("fn: field rule").
  if (err instanceof RangeError) {
    const match = err.message.match(/^\w+: ([\w.]+) (.+)$/);
    return new AppError('validation_failed', 'Some fields need attention', { fields: match ? { [match[1]]: match[2] } : { _: err.message } });
  }
  if (err instanceof ConnectionError || lostConnection(err)) {
    return new AppError('unavailable', 'The database is not reachable right now; try again shortly', { headers: { 'Retry-After': '5' } });
  }
  return new AppError('internal', 'Something went wrong on our side');
}

// A connection that dies mid-query reaches us as a query error whose driver cause is marked fatal
// (SQLSTATE class 08, "connection exception"); the transaction on it was rolled back by the server.
function lostConnection(err: unknown): boolean {
  const cause = driverCause(err);
  return cause?.fatal === true || (typeof cause?.sqlState === 'string' && cause.sqlState.startsWith('08'));
}

export function errorResponse(err: unknown, requestId?: string | null): Response {
  const appError = toAppError(err);
  if (appError.code === 'internal' || appError.code === 'unavailable') log.error({ err, requestId }, 'request failed');
  const body: ErrorBody = { error: { code: appError.code, message: appError.message } };
  if (appError.fields && Object.keys(appError.fields).length) body.error.fields = appError.fields;
  return Response.json(body, { status: appError.status, headers: appError.headers });
}
