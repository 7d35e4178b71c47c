import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { dayRange, dayStart, formatSiteDateTime, isTimeZone, shiftDay, siteDay, siteIsoWeek, siteYear } from './site-clock';

const hours = (r: { start?: Date; end?: Date }) => (r.end!.getTime() - r.start!.getTime()) / 3_600_000;

describe('site days and moments', () => {
  // EU summer time (Directive 2000/84/EC, from memory): starts the last Sunday of March and ends the
  // last Sunday of October, both at 01:00 UTC. In 2026 those are 29 March and 25 October.
  it('gives a Berlin DST day its 23 or 25 hours (EU rule, Directive 2000/84/EC)', () => {
    expect(hours(dayRange({ from: '2026-03-29', to: '2026-03-29' }, 'Europe/Berlin'))).toBe(23);
    expect(hours(dayRange({ from: '2026-10-25', to: '2026-10-25' }, 'Europe/Berlin'))).toBe(25);
    expect(dayStart('2026-10-25', 'Europe/Berlin').toISOString()).toBe('2026-10-24T22:00:00.000Z');
    expect(dayStart('2026-10-26', 'Europe/Berlin').toISOString()).toBe('2026-10-25T23:00:00.000Z');
  });

  // US daylight time (Energy Policy Act of 2005, from memory): second Sunday of March to the first
  // Sunday of November, at 02:00 local; in 2026, 8 March and 1 November.
  it('follows the US rule in Chicago (Energy Policy Act 2005)', () => {
    expect(hours(dayRange({ from: '2026-03-08', to: '2026-03-08' }, 'America/Chicago'))).toBe(23);
    expect(hours(dayRange({ from: '2026-11-01', to: '2026-11-01' }, 'America/Chicago'))).toBe(25);
    // 05:30 UTC on 3 December is still the evening of the 2nd in Chicago (UTC−6 in winter).
    expect(siteDay('America/Chicago', new Date('2026-12-03T05:30:00Z'))).toBe('2026-12-02');
    expect(formatSiteDateTime('2026-12-03T05:30:00Z', 'America/Chicago')).toBe('2026-12-02 23:30');
  });

  it('agrees with Luxon (an independent zone library) on day starts and local times across a year of zones', () => {
    const zones = [
      'UTC',
      'Europe/Berlin',
      'America/Chicago',
      'Asia/Kolkata',
      'Australia/Adelaide',
      'Pacific/Chatham',
      'America/Sao_Paulo',
      'Pacific/Kiritimati',
      'America/St_Johns',
    ];
    for (const zone of zones) {
      for (let d = 0; d < 366; d += 5) {
        const day = shiftDay('2026-01-01', d);
        const luxStart = DateTime.fromISO(day, { zone }).startOf('day');
        expect(dayStart(day, zone).getTime(), `${zone} ${day}`).toBe(luxStart.toMillis());
        const at = new Date(Date.UTC(2026, 0, 1 + d, (d * 7) % 24, (d * 13) % 60));
        const lux = DateTime.fromJSDate(at, { zone });
        expect(formatSiteDateTime(at, zone)).toBe(lux.toFormat('yyyy-MM-dd HH:mm'));
        expect(siteDay(zone, at)).toBe(lux.toISODate());
        expect(siteIsoWeek(at, zone)).toBe(`${lux.weekYear}-W${String(lux.weekNumber).padStart(2, '0')}`);
      }
    }
  });

  // ISO 8601: week 1 holds the year's first Thursday; 2026 starts on a Thursday, so it has 53 weeks.
  it('numbers ISO 8601 weeks in the site zone', () => {
    expect(siteIsoWeek(new Date('2026-12-31T12:00:00Z'), 'UTC')).toBe('2026-W53');
    expect(siteIsoWeek(new Date('2027-01-03T12:00:00Z'), 'UTC')).toBe('2026-W53');
    expect(siteIsoWeek(new Date('2027-01-04T12:00:00Z'), 'UTC')).toBe('2027-W01');
    // Sunday 23:30 in UTC is already Monday of the next week in Tokyo.
    expect(siteIsoWeek(new Date('2026-12-06T23:30:00Z'), 'UTC')).toBe('2026-W49');
    expect(siteIsoWeek(new Date('2026-12-06T23:30:00Z'), 'Asia/Tokyo')).toBe('2026-W50');
  });

  it('moves plain days by whole days, across month, year and leap day', () => {
    expect(shiftDay('2026-12-31', 1)).toBe('2027-01-01');
    expect(shiftDay('2028-02-28', 1)).toBe('2028-02-29');
    expect(shiftDay('2026-03-01', -1)).toBe('2026-02-28');
    expect(siteYear('Pacific/Kiritimati', new Date('2026-12-31T10:00:00Z'))).toBe(2027);
  });

  it('takes only IANA zone names, and plain days only as yyyy-mm-dd', () => {
    expect(isTimeZone('Europe/Berlin')).toBe(true);
    expect(isTimeZone('UTC')).toBe(true);
    expect(isTimeZone('Mars/Olympus')).toBe(false);
    expect(isTimeZone('CET+1')).toBe(false);
    expect(() => shiftDay('3 Dec', 1)).toThrow(RangeError);
  });
});
