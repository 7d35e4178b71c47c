import type { ReactNode } from 'react';
import { navFor } from '@/lib/navigation';
import { ROLE_LABELS } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { Wordmark } from '../_components/mark';
import { signOutAction } from './actions';
import { NavLinks } from './_components/nav-links';

export default async function ShellLayout({ children }: { children: ReactNode }) {
  const user = await requirePageUser();
  const items = navFor(user.role);
  return (
    <div className="min-h-screen md:grid md:grid-cols-[15rem_1fr]">
      <aside className="bg-ink text-paper md:min-h-screen md:sticky md:top-0 flex md:flex-col">
        <div className="px-4 py-3 md:py-5 flex items-center justify-between md:block">
          <a href="/" className="text-paper" aria-label="Tallyforge home">
            <Wordmark />
          </a>
        </div>
        <NavLinks items={items} />
        <div className="hidden md:block mt-auto px-4 py-4 border-t border-ink-soft text-sm">
          <p className="font-medium">{user.name}</p>
          <p className="text-paper-line/80">{ROLE_LABELS[user.role]}</p>
          <form action={signOutAction} className="mt-3">
            <button type="submit" className="text-brass hover:underline">
              Sign out
            </button>
          </form>
        </div>
      </aside>
      <div className="min-w-0">
        <div className="md:hidden flex items-center justify-between px-4 py-2 bg-paper-deep text-sm">
          <span>
            {user.name} · {ROLE_LABELS[user.role]}
          </span>
          <form action={signOutAction}>
            <button type="submit" className="text-forge font-medium min-h-11 px-2">
              Sign out
            </button>
          </form>
        </div>
        <main className="px-4 py-6 md:px-8 md:py-8 max-w-7xl">{children}</main>
      </div>
    </div>
  );
}
