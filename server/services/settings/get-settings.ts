import 'server-only';
import { SiteSettings } from '@/models';
import { getDb } from '../../db';
import type { SettingsDto } from '@/lib/contracts/settings';
import { serverTimeZone } from './server-time-zone';

export function toSettingsDto(s: SiteSettings): SettingsDto {
  return {
    siteName: s.siteName,
    displayUnit: s.displayUnit as SettingsDto['displayUnit'],
    defaultPieceSpread: Number(s.defaultPieceSpread),
    stabilityWindowMs: s.stabilityWindowMs,
    varianceThresholdPct: Number(s.varianceThresholdPct),
    varianceThresholdPcs: s.varianceThresholdPcs,
    blindCycleCounts: s.blindCycleCounts,
    timeZone: s.timeZone ?? serverTimeZone(),
    timeZoneFromServer: s.timeZone === null || s.timeZone === undefined,
    sessionHours: s.sessionHours,
    fourEyesVariances: s.fourEyesVariances,
    version: s.version,
  };
}

export async function getSettings(): Promise<SettingsDto> {
  getDb();
  const row = await SiteSettings.findByPk(1);
  if (!row) throw new Error('site_settings row 1 is missing; run the migrations');
  return toSettingsDto(row);
}

/** The zone the shop keeps its days in. */
export async function siteTimeZone(): Promise<string> {
  return (await getSettings()).timeZone;
}
