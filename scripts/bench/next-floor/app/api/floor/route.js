// The framework floor: the least a Next.js route handler can do, answering JSON, uncached.
export const dynamic = 'force-dynamic';

export function GET() {
  return Response.json({ ok: true });
}
