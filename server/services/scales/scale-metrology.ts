import 'server-only';
import { classConformity, minimumCapacity, type AccuracyClass } from '@/lib/metrology/accuracy-class';
import { AppError } from '../../errors';

export interface ScaleMetrology {
  capacity: number;
  division: number;
  verificationInterval: number;
  accuracyClass: AccuracyClass;
  minLoad?: number;
}

// Checks a scale profile against its accuracy class and fills in Min (grams in, grams out).
export function checkScaleMetrology(m: ScaleMetrology): { minLoad: number } {
  const fields: Record<string, string> = {};
  if (m.verificationInterval < m.division) fields.verificationInterval = 'e cannot be smaller than d (OIML R 76-1 requires d ≤ e)';
  if (m.capacity <= m.verificationInterval) fields.capacity = 'Max must be larger than e';
  const conformity = classConformity(m.accuracyClass, m.capacity, m.verificationInterval);
  if (conformity) fields.accuracyClass = `${conformity} (OIML R 76-1 Table 3)`;
  const minLoad = m.minLoad ?? minimumCapacity(m.accuracyClass, m.verificationInterval);
  if (minLoad >= m.capacity) fields.minLoad = 'Min must be below Max';
  if (Object.keys(fields).length) throw new AppError('validation_failed', 'The scale profile does not hold together', { fields });
  return { minLoad };
}
