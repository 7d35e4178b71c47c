import 'server-only';
import type { NextRequest } from 'next/server';
import { AppError } from '../errors';
import { idempotencyKeySchema } from '@/lib/contracts/common';

/** The request's Idempotency-Key header, checked; `required` refuses a request without one. */
export function idempotencyKeyOf(req: NextRequest, { required }: { required: boolean }): string | undefined {
  const raw = req.headers.get('idempotency-key') ?? undefined;
  if (raw === undefined && !required) return undefined;
  const key = idempotencyKeySchema.safeParse(raw);
  if (!key.success) throw new AppError('validation_failed', key.error.issues[0].message, { fields: { 'Idempotency-Key': key.error.issues[0].message } });
  return key.data;
}

/** 201 for a create, the same for its replay, and a header that says which it was. */
export function createdOnce(data: unknown, replayed: boolean): Response {
  return Response.json(data, { status: 201, headers: { 'Idempotent-Replayed': String(replayed), 'Cache-Control': 'no-store' } });
}
