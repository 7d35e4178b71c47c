import 'server-only';
import { SiteSettings } from '@/models';
import { getDb } from '../../db';
import type { SettingsDto } from '../../schemas/settings';

export function toSettingsDto(s: SiteSettings): SettingsDto {
  return {
    siteName: s.siteName,
    displayUnit: s.displayUnit as SettingsDto['displayUnit'],
    defaultPieceSpread: Number(s.defaultPieceSpread),
    stabilityWindowMs: s.stabilityWindowMs,
    varianceThresholdPct: Number(s.varianceThresholdPct),
    varianceThresholdPcs: s.varianceThresholdPcs,
    blindCycleCounts: s.blindCycleCounts,
    version: s.version,
  };
}

export async function getSettings(): Promise<SettingsDto> {
  getDb();
  const row = await SiteSettings.findByPk(1);
  if (!row) throw new Error('site_settings row 1 is missing; run the migrations');
  return toSettingsDto(row);
}
