import { describe, expect, it } from 'vitest';
import { can, ROLE_PERMISSIONS, ROLES } from './roles';

// The expected grid is copied from the role table in the architecture notes (docs/architecture.md),
// so a change to lib/roles.ts that drifts from the agreed design fails here.
const designTable: Record<string, string> = {
  'catalog.read': 'operator planner clerk quality admin',
  'counts.capture': 'operator clerk quality admin',
  'parts.edit': 'planner clerk admin',
  'kits.edit': 'planner admin',
  'orders.manage': 'planner admin',
  'bins.edit': 'clerk admin',
  'variances.approve': 'planner quality admin',
  'labels.print': 'planner clerk admin',
  'calibration.manage': 'quality admin',
  'audits.run': 'quality admin',
  'admin.manage': 'admin',
};

describe('role permissions', () => {
  it('grants exactly the roles of the design table for every permission', () => {
    expect(Object.keys(ROLE_PERMISSIONS).sort()).toEqual(Object.keys(designTable).sort());
    for (const [permission, roles] of Object.entries(designTable)) {
      for (const role of ROLES) {
        expect(can(role, permission as keyof typeof ROLE_PERMISSIONS), `${role} ${permission}`).toBe(roles.split(' ').includes(role));
      }
    }
  });

  it('never lets an operator print labels, since kit labels come from the server on completion', () => {
    expect(can('operator', 'labels.print')).toBe(false);
  });
});
