// Roles and permissions as data: one closed list, one table, one check.
// The role matrix test and the navigation read this same table.
export const ROLES = ['operator', 'planner', 'clerk', 'quality', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  operator: 'Kitting operator',
  planner: 'Production planner',
  clerk: 'Stockroom clerk',
  quality: 'Quality engineer',
  admin: 'Administrator',
};

export const PERMISSIONS = {
  'catalog.read': 'Read parts, kits, orders, bins and scales',
  'counts.capture': 'Capture counts and samples at the bench',
  'parts.edit': 'Edit and import parts',
  'kits.edit': 'Edit kits and bills of material',
  'orders.manage': 'Create, release, complete and cancel build orders',
  'bins.edit': 'Edit bins and containers, plan cycle counts',
  'variances.approve': 'Approve variances above the threshold, and samples held for review',
  'labels.print': 'Print labels',
  'calibration.manage': 'Record calibrations, manage test weights, lock and unlock scales',
  'audits.run': 'Run count audits and read accuracy reports',
  'admin.manage': "Manage scales' profiles, users and site settings",
} as const;
export type Permission = keyof typeof PERMISSIONS;

const ALL: readonly Role[] = ROLES;
export const ROLE_PERMISSIONS: Record<Permission, readonly Role[]> = {
  'catalog.read': ALL,
  'counts.capture': ['operator', 'clerk', 'quality', 'admin'],
  'parts.edit': ['planner', 'clerk', 'admin'],
  'kits.edit': ['planner', 'admin'],
  'orders.manage': ['planner', 'admin'],
  'bins.edit': ['clerk', 'admin'],
  'variances.approve': ['planner', 'quality', 'admin'],
  'labels.print': ['planner', 'clerk', 'admin'],
  'calibration.manage': ['quality', 'admin'],
  'audits.run': ['quality', 'admin'],
  'admin.manage': ['admin'],
};

export function can(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[permission].includes(role);
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
