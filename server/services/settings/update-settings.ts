import 'server-only';
import { SiteSettings } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { SettingsDto, UpdateSettingsInput } from '@/lib/contracts/settings';
import { toSettingsDto } from './get-settings';

export async function updateSettings({ input }: { input: UpdateSettingsInput }): Promise<SettingsDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const row = await SiteSettings.findByPk(1, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new Error('site_settings row 1 is missing; run the migrations');
    if (row.version !== input.version) throw new AppError('stale_version', 'Settings were changed by someone else; reload and try again');
    const { version: _v, defaultPieceSpread, varianceThresholdPct, ...rest } = input;
    row.set(rest);
    if (defaultPieceSpread !== undefined) row.defaultPieceSpread = String(defaultPieceSpread);
    if (varianceThresholdPct !== undefined) row.varianceThresholdPct = String(varianceThresholdPct);
    await row.save({ transaction });
    return toSettingsDto(row);
  });
}
