import { can, type Permission, type Role } from './roles';

export type NavGroup = 'work' | 'stock' | 'quality' | 'admin';

export interface NavItem {
  href: string;
  label: string;
  permission?: Permission;
  group: NavGroup;
}

// Only routes that exist are listed; each one names the permission its page checks.
export const NAV_ITEMS: readonly NavItem[] = [
  { href: '/', label: 'Today', group: 'work' },
  { href: '/bench', label: 'Bench', permission: 'counts.capture', group: 'work' },
  { href: '/counts', label: 'Count log', permission: 'catalog.read', group: 'work' },
  { href: '/orders', label: 'Build orders', permission: 'catalog.read', group: 'work' },
  { href: '/kits', label: 'Kits', permission: 'catalog.read', group: 'work' },
  { href: '/parts', label: 'Parts', permission: 'catalog.read', group: 'work' },
  { href: '/bins', label: 'Bins', permission: 'catalog.read', group: 'stock' },
  { href: '/bins/variances', label: 'Variances', permission: 'catalog.read', group: 'stock' },
  { href: '/labels', label: 'Labels', permission: 'labels.print', group: 'stock' },
  { href: '/scales', label: 'Scales', permission: 'catalog.read', group: 'quality' },
  { href: '/quality/test-weights', label: 'Test weights', permission: 'calibration.manage', group: 'quality' },
  { href: '/quality/audits', label: 'Count audits', permission: 'audits.run', group: 'quality' },
  { href: '/quality/reports', label: 'Accuracy report', permission: 'audits.run', group: 'quality' },
  { href: '/admin/users', label: 'People', permission: 'admin.manage', group: 'admin' },
  { href: '/admin/settings', label: 'Site settings', permission: 'admin.manage', group: 'admin' },
  { href: '/admin/mail', label: 'Outbox', permission: 'admin.manage', group: 'admin' },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.permission || can(role, item.permission));
}
