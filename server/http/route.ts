import 'server-only';
import type { NextRequest } from 'next/server';
import type { z } from 'zod';
import type { Permission } from '@/lib/roles';
import { requirePermission, requireUser } from '../auth/authorize';
import { getCurrentUser, keepSessionFresh, type SessionUser } from '../auth/session';
import { AppError } from '../errors';
import { errorResponse } from './errors-to-response';
import { assertJsonShape, JSON_BODY_LIMIT, readBodyText } from './read-body';
import { rejectCrossSite } from './reject-cross-site';
import { requestIdOf } from './request-id';
import { zodFields } from './zod-fields';

type Access = Permission | 'signed-in' | 'public';
type Parsed<S> = S extends z.ZodType ? z.infer<S> : undefined;

interface RouteSpec<A extends Access, B, Q, P> {
  access: A;
  body?: B;
  query?: Q;
  params?: P;
  /** The largest body this address takes, bytes (JSON_BODY_LIMIT unless said). */
  maxBodyBytes?: number;
}

export interface RouteContext<A extends Access, B, Q, P> {
  req: NextRequest;
  user: A extends 'public' ? SessionUser | null : SessionUser;
  body: Parsed<B>;
  query: Parsed<Q>;
  params: Parsed<P>;
}

// Thin wrapper: reject cross-site writes, authorize, parse with zod, run one service, answer. Every answer
// carries the request's id and no-store unless the handler chose its own caching: answers about people
// and stock are never kept by a browser or a proxy on the way.
// A handler returns a Response, a plain object (200 JSON) or nothing (204).
export function route<
  A extends Access,
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(spec: RouteSpec<A, B, Q, P>, handler: (ctx: RouteContext<A, B, Q, P>) => Promise<unknown>) {
  return async (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }): Promise<Response> => {
    const requestId = requestIdOf(req.headers);
    const res = await answer(req, ctx, requestId);
    res.headers.set('x-request-id', requestId);
    if (!res.headers.has('Cache-Control')) res.headers.set('Cache-Control', 'no-store');
    return res;
  };

  async function answer(req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }, requestId: string): Promise<Response> {
    try {
      rejectCrossSite(req);
      const user =
        spec.access === 'public'
          ? await getCurrentUser()
          : spec.access === 'signed-in'
            ? await requireUser()
            : await requirePermission(spec.access as Permission);
      if (user) await keepSessionFresh();
      const params = parseWith(spec.params, await ctx.params, 'Bad address');
      const query = parseWith(spec.query, Object.fromEntries(req.nextUrl.searchParams), 'Bad query');
      const body = spec.body ? parseWith(spec.body, await readJson(req, spec.maxBodyBytes ?? JSON_BODY_LIMIT), 'Some fields need attention') : undefined;
      const result = await handler({ req, user, body, query, params } as RouteContext<A, B, Q, P>);
      if (result instanceof Response) return result;
      if (result === undefined) return new Response(null, { status: 204 });
      return Response.json(result);
    } catch (err) {
      return errorResponse(err, requestId);
    }
  }
}

function parseWith(schema: z.ZodType | undefined, value: unknown, message: string): unknown {
  if (!schema) return undefined;
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new AppError('validation_failed', message, { fields: zodFields(parsed.error) });
  return parsed.data;
}

async function readJson(req: NextRequest, limit: number): Promise<unknown> {
  const text = await readBodyText(req, limit);
  if (!text.trim()) return {};
  // A body under another type is refused rather than guessed at: it is not what our clients send,
  // and a form or text/plain post is what a cross-site page can send without a preflight.
  if (!isJsonMediaType(req.headers.get('content-type'))) {
    throw new AppError('unsupported_media_type', 'Send the body as JSON, with Content-Type: application/json');
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError('invalid_json', 'The request body is not valid JSON');
  }
  assertJsonShape(value);
  return value;
}

export function created(data: unknown): Response {
  return Response.json(data, { status: 201 });
}

// application/json or a +json type (RFC 6839), in UTF-8: the only charset JSON text may use on the wire (RFC 8259 §8.1).
function isJsonMediaType(header: string | null): boolean {
  if (!header) return false;
  const [type, ...params] = header.split(';').map((p) => p.trim().toLowerCase());
  if (type !== 'application/json' && !/^application\/[a-z0-9.!#$&^_-]+\+json$/.test(type)) return false;
  const charset = params
    .find((p) => p.startsWith('charset='))
    ?.slice('charset='.length)
    .replace(/"/g, '');
  return charset === undefined || charset === 'utf-8';
}
