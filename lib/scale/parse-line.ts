/** One framed line → reading fields, or the reason it was refused. Never throws. */
import type { WeightUnit } from '../weighing/units';
import { readUnitWord, type LineProfile } from './line-format';

export const MAX_LINE_LENGTH: number = 80;

export interface LineFields {
  gross: number;
  unit: WeightUnit;
  stable?: boolean;
}

export type RejectReason = 'empty' | 'too_long' | 'no_match' | 'bad_number' | 'unknown_unit' | 'unknown_flag';

export type ParsedLine = { ok: true; fields: LineFields } | { ok: false; reason: RejectReason };

export function parseLine(profile: LineProfile, line: string): ParsedLine {
  if (line.trim().length === 0) return { ok: false, reason: 'empty' };
  if (line.length > MAX_LINE_LENGTH) return { ok: false, reason: 'too_long' };
  profile.pattern.lastIndex = 0; // harmless for our patterns; protects a site profile written with /g
  const groups = profile.pattern.exec(line)?.groups;
  if (!groups || groups.weight === undefined) return { ok: false, reason: 'no_match' };
  const magnitude = Number(groups.weight);
  if (!Number.isFinite(magnitude)) return { ok: false, reason: 'bad_number' };
  // `|| 0` turns a "-0.00" reading into plain zero.
  const gross = (groups.sign === '-' ? -magnitude : magnitude) || 0;
  const unit = groups.unit === undefined ? profile.defaultUnit : readUnitWord(groups.unit);
  if (unit === undefined) return { ok: false, reason: 'unknown_unit' };
  const fields: LineFields = { gross, unit };
  if (groups.flag !== undefined) {
    const stable = profile.flags?.[groups.flag];
    if (stable === undefined) return { ok: false, reason: 'unknown_flag' };
    fields.stable = stable;
  }
  return { ok: true, fields };
}

/**
 * Write reading fields as the profile's line (for fakes, the simulator bench and round-trip tests).
 * A profile without a unit field can only carry its default unit; a missing stable flag is written as moving.
 */
export function formatLine(profile: LineProfile, fields: LineFields, decimals: number): string {
  if (!profile.template.includes('{unit}') && fields.unit !== profile.defaultUnit) {
    throw new RangeError(`${profile.name} carries ${profile.defaultUnit} only`);
  }
  const flagText = Object.entries(profile.flags ?? {}).find(([, stable]) => stable === (fields.stable ?? false))?.[0] ?? '';
  const rounded = Number(Math.abs(fields.gross).toFixed(decimals));
  const sign = fields.gross < 0 && rounded !== 0 ? '-' : profile.positiveSign;
  const weight = rounded.toFixed(decimals).padStart(profile.weightWidth, '0');
  return profile.template.replace('{flag}', flagText).replace('{sign}', sign).replace('{weight}', weight).replace('{unit}', fields.unit);
}
