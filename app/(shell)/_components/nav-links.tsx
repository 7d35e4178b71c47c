'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { NavItem } from '@/lib/navigation';

// `rail`: the desk sidebar, one column. `drawer`: the folded menu, groups side by side.
export function NavLinks({ items, layout }: { items: NavItem[]; layout: 'rail' | 'drawer' }) {
  const pathname = usePathname();
  const groups: Array<[NavItem['group'], string]> = [
    ['work', 'Work'],
    ['stock', 'Stockroom'],
    ['quality', 'Quality'],
    ['admin', 'Administration'],
  ];
  return (
    <nav aria-label="Main" className={layout === 'rail' ? 'flex-1 px-3 py-2' : 'grid grid-cols-2 gap-x-2 gap-y-3 px-3 py-3 sm:grid-cols-4'}>
      {groups.map(([group, title]) => {
        const entries = items.filter((i) => i.group === group);
        if (!entries.length) return null;
        return (
          <div key={group} className={layout === 'rail' ? 'mb-4' : ''}>
            <p className="px-3 pb-1 text-xs uppercase tracking-wider text-paper-line/60">{title}</p>
            {entries.map((item) => {
              const active = isActive(item.href, pathname, items);
              return (
                <Link
                  key={item.href}
                  href={item.href}
                  aria-current={active ? 'page' : undefined}
                  className={`block whitespace-nowrap rounded-md px-3 py-2.5 min-h-11 ${active ? 'bg-forge text-white' : 'text-paper hover:bg-ink-soft'}`}
                >
                  {item.label}
                </Link>
              );
            })}
          </div>
        );
      })}
    </nav>
  );
}

// The longest matching entry wins, so /bins/variances does not also light up /bins.
function isActive(href: string, pathname: string, items: NavItem[]): boolean {
  const matches = (h: string) => (h === '/' ? pathname === '/' : pathname === h || pathname.startsWith(`${h}/`));
  if (!matches(href)) return false;
  return !items.some((other) => other.href.length > href.length && other.href.startsWith(href) && matches(other.href));
}
