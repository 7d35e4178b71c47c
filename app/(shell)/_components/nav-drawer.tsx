'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useEffect, useState, type ReactNode } from 'react';
import type { NavItem } from '@/lib/navigation';
import { Wordmark } from '../../_components/mark';
import { NavLinks } from './nav-links';

// Below desk width the navigation folds into a bar with a Menu button, so a portrait tablet gives
// the page its whole width. It folds again after a link is followed or on Escape.
export function NavDrawer({ items, children }: { items: NavItem[]; children: ReactNode }) {
  // Open on the page it was opened on: following a link changes the page, which folds it.
  const pathname = usePathname();
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  const setOpen = (value: boolean) => setOpenOn(value ? pathname : null);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpenOn(null);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [open]);
  return (
    <div className="lg:hidden bg-ink text-paper">
      <div className="flex items-center justify-between gap-2 px-4 py-1.5">
        <Link href="/" className="text-paper" aria-label="Tallyforge home">
          <Wordmark />
        </Link>
        <button
          type="button"
          className="inline-flex min-h-11 min-w-11 items-center gap-2 rounded-md px-3 font-medium text-paper hover:bg-ink-soft"
          aria-expanded={open}
          aria-controls="nav-drawer"
          onClick={() => setOpen(!open)}
        >
          <svg width="22" height="22" viewBox="0 0 22 22" aria-hidden="true" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round">
            {open ? <path d="M5 5l12 12M17 5 5 17" /> : <path d="M3 6h16M3 11h16M3 16h10" />}
          </svg>
          {open ? 'Close' : 'Menu'}
        </button>
      </div>
      {open ? (
        <div id="nav-drawer" className="border-t border-ink-soft pb-2">
          <NavLinks items={items} layout="drawer" />
          {children}
        </div>
      ) : null}
    </div>
  );
}
