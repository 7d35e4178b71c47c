import Link from 'next/link';
import type { ReactNode } from 'react';
import { navFor } from '@/lib/navigation';
import { ROLE_LABELS } from '@/lib/roles';
import { requireShellUser } from '@/server/auth/authorize';
import { siteTimeZone } from '@/server/services/settings/get-settings';
import { Wordmark } from '../_components/mark';
import { SiteTimeProvider } from '../_components/site-time';
import { signOutAction, signOutEverywhereAction } from './actions';
import { NavDrawer } from './_components/nav-drawer';
import { NavLinks } from './_components/nav-links';

function WhoIsHere({ name, role, timeZone }: { name: string; role: string; timeZone: string }) {
  return (
    <div className="px-4 py-3 border-t border-ink-soft text-sm">
      <p className="font-medium">{name}</p>
      <p className="text-paper-line/80">{role}</p>
      <p className="mt-1 text-paper-line/80" data-testid="site-time-zone">
        Times in {timeZone}
      </p>
      <div className="mt-2 flex flex-wrap gap-x-4">
        <form action={signOutAction}>
          <button type="submit" className="min-h-11 text-brass hover:underline">
            Sign out
          </button>
        </form>
        <form action={signOutEverywhereAction}>
          <button type="submit" className="min-h-11 text-paper-line hover:underline" title="Ends your sessions on every device, this one included">
            Sign out everywhere
          </button>
        </form>
      </div>
    </div>
  );
}

// At desk width a sidebar; below it (portrait tablets) a bar whose Menu folds the same links out.
export default async function ShellLayout({ children }: { children: ReactNode }) {
  const user = await requireShellUser();
  const items = navFor(user.role);
  const timeZone = await siteTimeZone();
  const who = <WhoIsHere name={user.name} role={ROLE_LABELS[user.role]} timeZone={timeZone} />;
  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[15rem_1fr]">
      <aside className="hidden lg:flex lg:flex-col lg:sticky lg:top-0 lg:h-screen lg:overflow-y-auto bg-ink text-paper">
        <div className="px-4 py-5">
          <Link href="/" className="text-paper" aria-label="Tallyforge home">
            <Wordmark />
          </Link>
        </div>
        <NavLinks items={items} layout="rail" />
        {who}
      </aside>
      <div className="min-w-0">
        <NavDrawer items={items}>{who}</NavDrawer>
        <main className="px-4 py-6 lg:px-8 lg:py-8 max-w-7xl">
          <SiteTimeProvider timeZone={timeZone}>{children}</SiteTimeProvider>
        </main>
      </div>
    </div>
  );
}
