import { beforeAll, describe, expect, it } from 'vitest';
import { apiRouteFiles } from '../helpers/route-files';
import { ROLES, type Role } from '../../lib/roles';
import { anonymous, signedIn, type Agent } from '../helpers/http';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
interface Entry {
  method: Method;
  route: string; // the file-system pattern under app/
  allowed: readonly Role[] | 'public';
  // A request that passes authorization must never write: bodies here are empty or invalid on purpose.
  path?: string;
  body?: unknown;
  // The request ends the session it was sent with, so it gets its own agent.
  endsSession?: boolean;
}

const everyone = ROLES;
const admin: Role[] = ['admin'];
const capture: Role[] = ['operator', 'clerk', 'quality', 'admin'];
const partEditors: Role[] = ['planner', 'clerk', 'admin'];
const binEditors: Role[] = ['clerk', 'admin'];
const planners: Role[] = ['planner', 'admin'];
const quality: Role[] = ['quality', 'admin'];
const printers: Role[] = ['planner', 'clerk', 'admin'];
const deciders: Role[] = ['planner', 'quality', 'admin'];

// Every route handler, and who may call it. Add each new route here (see DEVELOPERS.md).
const MATRIX: Entry[] = [
  { method: 'GET', route: '/api/v1/health', allowed: 'public' },
  { method: 'GET', route: '/api/v1/health/live', allowed: 'public' },
  { method: 'POST', route: '/api/v1/session', allowed: 'public', body: {} },
  { method: 'GET', route: '/api/v1/session', allowed: 'public' },
  { method: 'DELETE', route: '/api/v1/session', allowed: 'public', endsSession: true },
  { method: 'DELETE', route: '/api/v1/session/everywhere', allowed: everyone, endsSession: true },
  { method: 'POST', route: '/api/v1/invitations/accept', allowed: 'public', body: {} },
  { method: 'GET', route: '/api/v1/users', allowed: admin },
  { method: 'POST', route: '/api/v1/users', allowed: admin, body: {} },
  { method: 'PATCH', route: '/api/v1/users/[id]', allowed: admin, path: '/api/v1/users/999999', body: {} },
  { method: 'POST', route: '/api/v1/users/[id]/invitation', allowed: admin, path: '/api/v1/users/999999/invitation' },
  { method: 'DELETE', route: '/api/v1/users/[id]/sessions', allowed: admin, path: '/api/v1/users/999999/sessions' },
  { method: 'GET', route: '/api/v1/mail', allowed: admin },
  { method: 'GET', route: '/api/v1/settings', allowed: everyone },
  { method: 'PATCH', route: '/api/v1/settings', allowed: admin, body: {} },
  { method: 'POST', route: '/api/v1/counting/estimate', allowed: everyone, body: {} },
  { method: 'GET', route: '/api/v1/scales', allowed: everyone },
  { method: 'POST', route: '/api/v1/scales', allowed: admin, body: {} },
  { method: 'GET', route: '/api/v1/scales/[id]', allowed: everyone, path: '/api/v1/scales/999999' },
  { method: 'PATCH', route: '/api/v1/scales/[id]', allowed: admin, path: '/api/v1/scales/999999', body: {} },
  { method: 'GET', route: '/api/v1/containers', allowed: everyone },
  { method: 'POST', route: '/api/v1/containers', allowed: binEditors, body: {} },
  { method: 'PATCH', route: '/api/v1/containers/[id]', allowed: binEditors, path: '/api/v1/containers/999999', body: {} },
  { method: 'GET', route: '/api/v1/parts', allowed: everyone },
  { method: 'POST', route: '/api/v1/parts', allowed: partEditors, body: {} },
  { method: 'GET', route: '/api/v1/parts/export', allowed: everyone },
  { method: 'POST', route: '/api/v1/parts/import', allowed: partEditors, body: {} },
  { method: 'GET', route: '/api/v1/parts/[id]', allowed: everyone, path: '/api/v1/parts/999999' },
  { method: 'PATCH', route: '/api/v1/parts/[id]', allowed: partEditors, path: '/api/v1/parts/999999', body: {} },
  { method: 'GET', route: '/api/v1/parts/[id]/samples', allowed: everyone, path: '/api/v1/parts/999999/samples' },
  { method: 'POST', route: '/api/v1/parts/[id]/samples', allowed: capture, path: '/api/v1/parts/999999/samples', body: {} },
  {
    method: 'POST',
    route: '/api/v1/parts/[id]/samples/[sampleId]/decision',
    allowed: deciders,
    path: '/api/v1/parts/999999/samples/999999/decision',
    body: {},
  },
  { method: 'GET', route: '/api/v1/counts', allowed: everyone },
  { method: 'POST', route: '/api/v1/counts', allowed: capture, body: {} },
  { method: 'GET', route: '/api/v1/counts/export', allowed: everyone },
  { method: 'GET', route: '/api/v1/kits', allowed: everyone },
  { method: 'POST', route: '/api/v1/kits', allowed: planners, body: {} },
  { method: 'POST', route: '/api/v1/kits/import', allowed: planners, body: {} },
  { method: 'GET', route: '/api/v1/kits/[id]', allowed: everyone, path: '/api/v1/kits/999999' },
  { method: 'PATCH', route: '/api/v1/kits/[id]', allowed: planners, path: '/api/v1/kits/999999', body: {} },
  { method: 'POST', route: '/api/v1/kits/[id]/revisions', allowed: planners, path: '/api/v1/kits/999999/revisions', body: {} },
  { method: 'GET', route: '/api/v1/orders', allowed: everyone },
  { method: 'POST', route: '/api/v1/orders', allowed: planners, body: {} },
  { method: 'GET', route: '/api/v1/orders/[id]', allowed: everyone, path: '/api/v1/orders/999999' },
  { method: 'GET', route: '/api/v1/orders/[id]/availability', allowed: everyone, path: '/api/v1/orders/999999/availability' },
  { method: 'POST', route: '/api/v1/orders/[id]/release', allowed: planners, path: '/api/v1/orders/999999/release', body: {} },
  { method: 'POST', route: '/api/v1/orders/[id]/cancel', allowed: planners, path: '/api/v1/orders/999999/cancel', body: {} },
  { method: 'POST', route: '/api/v1/orders/[id]/lines/[lineId]/recount', allowed: planners, path: '/api/v1/orders/999999/lines/999999/recount', body: {} },
  { method: 'POST', route: '/api/v1/orders/[id]/complete', allowed: planners, path: '/api/v1/orders/999999/complete', body: {} },
  { method: 'GET', route: '/api/v1/kitting-queue', allowed: everyone },
  { method: 'GET', route: '/api/v1/bins', allowed: everyone },
  { method: 'POST', route: '/api/v1/bins', allowed: binEditors, body: {} },
  { method: 'POST', route: '/api/v1/calibration/evaluate', allowed: quality, body: {} },
  { method: 'GET', route: '/api/v1/test-weights', allowed: everyone },
  { method: 'POST', route: '/api/v1/test-weights', allowed: quality, body: {} },
  { method: 'GET', route: '/api/v1/scales/[id]/calibrations', allowed: everyone, path: '/api/v1/scales/999999/calibrations' },
  { method: 'POST', route: '/api/v1/scales/[id]/calibrations', allowed: quality, path: '/api/v1/scales/999999/calibrations', body: {} },
  { method: 'POST', route: '/api/v1/scales/[id]/lock', allowed: quality, path: '/api/v1/scales/999999/lock', body: {} },
  // Running the reminder job is idempotent: a second run changes nothing.
  { method: 'POST', route: '/api/v1/jobs/calibration-reminders', allowed: quality },
  { method: 'GET', route: '/api/v1/audits/sampling-plan', allowed: quality },
  { method: 'GET', route: '/api/v1/audits', allowed: quality },
  { method: 'POST', route: '/api/v1/audits', allowed: quality, body: {} },
  { method: 'GET', route: '/api/v1/audits/[id]', allowed: quality, path: '/api/v1/audits/999999' },
  { method: 'PUT', route: '/api/v1/audits/[id]/items/[itemId]', allowed: quality, path: '/api/v1/audits/999999/items/1', body: {} },
  { method: 'GET', route: '/api/v1/reports/accuracy', allowed: quality },
  { method: 'GET', route: '/api/v1/bins/due', allowed: everyone },
  { method: 'GET', route: '/api/v1/bin-counts', allowed: everyone },
  { method: 'POST', route: '/api/v1/bin-counts/[id]/decision', allowed: ['planner', 'quality', 'admin'], path: '/api/v1/bin-counts/999999/decision', body: {} },
  { method: 'GET', route: '/api/v1/bins/[id]/label.pdf', allowed: printers, path: '/api/v1/bins/999999/label.pdf' },
  { method: 'POST', route: '/api/v1/labels', allowed: printers, body: {} },
  { method: 'GET', route: '/api/v1/print-jobs', allowed: printers },
  { method: 'POST', route: '/api/v1/print-jobs', allowed: printers, body: {} },
  { method: 'GET', route: '/api/v1/parts/[id]/photo', allowed: everyone, path: '/api/v1/parts/999999/photo' },
  { method: 'PUT', route: '/api/v1/parts/[id]/photo', allowed: partEditors, path: '/api/v1/parts/999999/photo' },
  { method: 'GET', route: '/api/v1/test-weights/[id]/certificate', allowed: everyone, path: '/api/v1/test-weights/999999/certificate' },
  { method: 'PUT', route: '/api/v1/test-weights/[id]/certificate', allowed: quality, path: '/api/v1/test-weights/999999/certificate' },
  // Addresses no route serves answer 404 to anyone, signed in or not.
  ...(['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const).map((method): Entry => ({
    method,
    route: '/api/[...path]',
    allowed: 'public',
    path: '/api/v1/no-such-route',
  })),
];

const declared = apiRouteFiles().flatMap(({ route, source }) => {
  const methods = [...source.matchAll(/export const (GET|POST|PATCH|PUT|DELETE)\b/g)].map((m) => m[1]);
  return methods.map((method) => `${method} ${route}`);
});

function send(agent: Agent, e: Entry) {
  const url = e.path ?? e.route;
  const req = agent[e.method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'](url);
  return e.body === undefined ? req : req.send(e.body as object);
}

describe('role matrix', () => {
  it('lists every route handler that exists, and only those', () => {
    expect(MATRIX.map((e) => `${e.method} ${e.route}`).sort()).toEqual([...declared].sort());
  });

  const agents = new Map<Role, Agent>();
  beforeAll(async () => {
    for (const role of ROLES) agents.set(role, (await signedIn(role)).agent);
  });

  for (const entry of MATRIX) {
    const label = `${entry.method} ${entry.route}`;
    it(`${label}: signed out gets ${entry.allowed === 'public' ? 'through' : '401'}`, async () => {
      const res = await send(anonymous(), entry);
      if (entry.allowed === 'public') expect(res.status).not.toBe(403);
      else expect(res.status).toBe(401);
    });

    for (const role of ROLES) {
      const allowed = entry.allowed === 'public' || entry.allowed.includes(role);
      it(`${label}: ${role} ${allowed ? 'gets through' : 'gets 403'}`, async () => {
        const agent = entry.endsSession ? (await signedIn(role)).agent : agents.get(role)!;
        const res = await send(agent, entry);
        if (allowed) expect([401, 403]).not.toContain(res.status);
        else {
          expect(res.status).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
      });
    }
  }
});
