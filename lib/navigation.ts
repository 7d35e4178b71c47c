import { can, type Permission, type Role } from './roles';

export interface NavItem {
  href: string;
  label: string;
  permission?: Permission;
  group: 'work' | 'admin';
}

// Only routes that exist are listed; each one names the permission its page checks.
export const NAV_ITEMS: readonly NavItem[] = [
  { href: '/', label: 'Today', group: 'work' },
  { href: '/bench', label: 'Bench', permission: 'counts.capture', group: 'work' },
  { href: '/orders', label: 'Build orders', permission: 'catalog.read', group: 'work' },
  { href: '/kits', label: 'Kits', permission: 'catalog.read', group: 'work' },
  { href: '/parts', label: 'Parts', permission: 'catalog.read', group: 'work' },
  { href: '/admin/users', label: 'People', permission: 'admin.manage', group: 'admin' },
  { href: '/admin/settings', label: 'Site settings', permission: 'admin.manage', group: 'admin' },
  { href: '/admin/mail', label: 'Outbox', permission: 'admin.manage', group: 'admin' },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.permission || can(role, item.permission));
}
