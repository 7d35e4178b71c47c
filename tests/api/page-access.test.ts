import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../lib/roles';
import { signedIn, type Agent } from '../helpers/http';

const everyone = ROLES;
const counters: Role[] = ['operator', 'clerk', 'quality', 'admin'];
const printers: Role[] = ['planner', 'clerk', 'admin'];
const quality: Role[] = ['quality', 'admin'];
const admin: Role[] = ['admin'];

// Who may open each page, written out from the permission table of the architecture (docs/architecture.md), not
// read from the app's own navigation. A detail page (of no such record) is only checked for its 403.
const PAGES: Array<[path: string, allowed: readonly Role[], detail?: true]> = [
  ['/', everyone],
  ['/bench', counters],
  ['/counts', everyone],
  ['/orders', everyone],
  ['/orders/999999', everyone, true],
  ['/kits', everyone],
  ['/kits/999999', everyone, true],
  ['/parts', everyone],
  ['/bins', everyone],
  ['/bins/variances', everyone],
  ['/labels', printers],
  ['/scales', everyone],
  ['/scales/999999', everyone, true],
  ['/quality/test-weights', quality],
  ['/quality/audits', quality],
  ['/quality/audits/999999', quality, true],
  ['/quality/reports', quality],
  ['/admin/users', admin],
  ['/admin/settings', admin],
  ['/admin/mail', admin],
];

const WHO: Record<Role, string> = {
  operator: 'a kitting operator',
  planner: 'a production planner',
  clerk: 'a stockroom clerk',
  quality: 'a quality engineer',
  admin: 'an administrator',
};

describe('page access', () => {
  const agents = new Map<Role, Agent>();

  for (const role of ROLES) {
    it(`answers a ${role} 403 with the explanation on each page the role may not open, and the page otherwise`, async () => {
      if (!agents.has(role)) agents.set(role, (await signedIn(role)).agent);
      const agent = agents.get(role)!;
      const wrong: string[] = [];
      for (const [path, allowed, detail] of PAGES) {
        const res = await agent.get(path);
        const refused = !allowed.includes(role);
        if (refused ? res.status !== 403 : detail ? res.status === 403 : res.status !== 200)
          wrong.push(`${path}: ${res.status}, expected ${refused ? 403 : 200}`);
        // The notice comes in the page's payload (rendered by its script), naming the role.
        if (refused && !res.text.includes(`Not available to ${WHO[role]}`)) wrong.push(`${path}: 403 without the explanation`);
      }
      expect(wrong).toEqual([]);
    });
  }
});
