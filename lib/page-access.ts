import type { Permission } from './roles';
import { NAV_ITEMS } from './navigation';

/**
 * The permission a page of the app needs, from the navigation's own table: a page below a listed one
 * (an order's page under Build orders) needs what its list needs. The shell checks it before it starts
 * sending the page, so a refusal can still be a 403; each page checks it again for itself.
 */
export function pagePermission(pathname: string): Permission | undefined {
  let best: { href: string; permission?: Permission } | undefined;
  for (const item of NAV_ITEMS) {
    const under = item.href === '/' ? pathname === '/' : pathname === item.href || pathname.startsWith(`${item.href}/`);
    if (under && (!best || item.href.length > best.href.length)) best = item;
  }
  return best?.permission;
}
