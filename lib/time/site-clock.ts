import { TZDate } from '@date-fns/tz';
import { addDays, format, getISOWeek, getISOWeekYear } from 'date-fns';

// The shop keeps local time: a "day" is a calendar day in the site's IANA time zone, and an
// instant shown to a person is written in that zone. Plain days ("2026-12-03") are kept as
// strings; only this module turns them into instants, so DST days are 23 or 25 hours long
// wherever the server runs.

const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: name });
    return name.includes('/') || name === 'UTC';
  } catch {
    return false;
  }
}

function parts(day: string): [number, number, number] {
  const m = DAY.exec(day);
  if (!m) throw new RangeError(`Not a calendar day (yyyy-mm-dd): ${day}`);
  return [Number(m[1]), Number(m[2]) - 1, Number(m[3])];
}

/** The calendar day it is at the site at `at`. */
export function siteDay(timeZone: string, at: Date = new Date()): string {
  return format(new TZDate(at.getTime(), timeZone), 'yyyy-MM-dd');
}

/** A calendar day moved by whole days (no zone: days are days). */
export function shiftDay(day: string, days: number): string {
  const [y, m, d] = parts(day);
  return format(addDays(new TZDate(y, m, d, 'UTC'), days), 'yyyy-MM-dd');
}

/** The instant the site's day begins (its first local moment, even when midnight is skipped by DST). */
export function dayStart(day: string, timeZone: string): Date {
  const [y, m, d] = parts(day);
  return new Date(new TZDate(y, m, d, timeZone).getTime());
}

/** Instants [start, end) covering site days `from` to `to`, both included; either may be absent. */
export function dayRange({ from, to }: { from?: string; to?: string }, timeZone: string): { start?: Date; end?: Date } {
  return { start: from ? dayStart(from, timeZone) : undefined, end: to ? dayStart(shiftDay(to, 1), timeZone) : undefined };
}

function zoned(at: string | Date, timeZone: string): TZDate {
  return new TZDate(typeof at === 'string' ? Date.parse(at) : at.getTime(), timeZone);
}

/** The one way Tallyforge writes a moment for people: "2026-12-03 14:05" in the site's zone. */
export function formatSiteDateTime(at: string | Date | null | undefined, timeZone: string): string {
  return at ? format(zoned(at, timeZone), 'yyyy-MM-dd HH:mm') : '—';
}

/** A time of day at the site, to the second, for "checked at" and queued captures. */
export function formatSiteClock(at: string | Date, timeZone: string): string {
  return format(zoned(at, timeZone), 'HH:mm:ss');
}

/** The site's calendar year at `at` (order numbers follow the shop's year, not UTC's). */
export function siteYear(timeZone: string, at: Date = new Date()): number {
  return zoned(at, timeZone).getFullYear();
}

/** ISO 8601 week of the site's day at `at`, as "2026-W49". */
export function siteIsoWeek(at: Date, timeZone: string): string {
  const local = zoned(at, timeZone);
  return `${getISOWeekYear(local)}-W${String(getISOWeek(local)).padStart(2, '0')}`;
}
