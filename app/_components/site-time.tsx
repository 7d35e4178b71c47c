'use client';

import { createContext, useContext, useMemo, type ReactNode } from 'react';
import { formatSiteClock, formatSiteDateTime, siteDay } from '@/lib/time/site-clock';

// The site's time zone, set once by the shell from the site settings, so every client component
// writes moments and "today" the way the server does, whatever zone the tablet is set to.
const SiteTimeZone = createContext<string>('UTC');

export function SiteTimeProvider({ timeZone, children }: { timeZone: string; children: ReactNode }) {
  return <SiteTimeZone.Provider value={timeZone}>{children}</SiteTimeZone.Provider>;
}

export function useSiteTime() {
  const timeZone = useContext(SiteTimeZone);
  return useMemo(
    () => ({
      timeZone,
      when: (at: string | Date | null | undefined) => formatSiteDateTime(at, timeZone),
      clock: (at: string | Date) => formatSiteClock(at, timeZone),
      today: () => siteDay(timeZone),
    }),
    [timeZone],
  );
}
