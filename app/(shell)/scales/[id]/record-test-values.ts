import { defaultTestLoads } from '@/lib/metrology/evaluate-calibration';
import { formatWeight } from '@/lib/weighing/display-decimals';
import type { ScaleDto } from '@/lib/contracts/scales';

// Form state in the API's own shape, so the server's field paths ("points.1.indication") land on inputs.
export interface TestValues {
  stage: 'initial' | 'in_service';
  performedAt: string;
  points: Array<{ load: string; indication: string; testWeightIds: number[] }>;
  withRepeatability: boolean;
  repeatability: { load: string; indications: string[] };
  withEccentricity: boolean;
  eccentricity: { load: string; indications: string[] };
  zeroOk: boolean;
  tareOk: boolean;
  intervalDays: string;
  notes: string;
}

// A load on the scale's e grid, written with e's decimals (not 206.67000000000002).
const onGrid = (x: number, e: number) => formatWeight(Math.round(x / e) * e, e);
const blanks = (n: number) => Array.from({ length: n }, () => '');

// Repeatability near half of Max with three weighings, eccentricity at about a third of Max on
// four off-centre positions (common practice after OIML R 76-2's test procedures, from memory).
export function initialTestValues(scale: ScaleDto, today: string): TestValues {
  const e = scale.verificationInterval;
  return {
    stage: 'in_service',
    performedAt: today,
    points: defaultTestLoads(scale.accuracyClass, e, scale.capacity).map((load) => ({ load: onGrid(load, e), indication: '', testWeightIds: [] })),
    withRepeatability: true,
    repeatability: { load: onGrid(scale.capacity / 2, e), indications: blanks(3) },
    withEccentricity: true,
    eccentricity: { load: onGrid(scale.capacity / 3, e), indications: blanks(4) },
    zeroOk: true,
    tareOk: true,
    intervalDays: '180',
    notes: '',
  };
}

export function resize(list: string[], n: number): string[] {
  return n <= list.length ? list.slice(0, n) : [...list, ...blanks(n - list.length)];
}

const filled = (xs: string[]) => xs.length > 0 && xs.every((x) => x.trim() !== '' && Number.isFinite(Number(x)));

// The part of the test the evaluate endpoint can judge, or null until every point has an indication.
export function evaluateBody(v: TestValues, scale: ScaleDto) {
  if (!v.points.length || !v.points.every((p) => filled([p.load, p.indication]))) return null;
  const series = (s: { load: string; indications: string[] }) =>
    filled([s.load, ...s.indications]) ? { load: Number(s.load), indications: s.indications.map(Number) } : null;
  return {
    accuracyClass: scale.accuracyClass,
    verificationInterval: scale.verificationInterval,
    capacity: scale.capacity,
    unit: 'g' as const,
    stage: v.stage,
    points: v.points.map((p) => ({ load: Number(p.load), indication: Number(p.indication) })),
    repeatability: v.withRepeatability ? series(v.repeatability) : null,
    eccentricity: v.withEccentricity ? series(v.eccentricity) : null,
  };
}

export function recordBody(v: TestValues) {
  const series = (s: { load: string; indications: string[] }) => ({ load: Number(s.load), indications: s.indications.map(Number) });
  return {
    stage: v.stage,
    performedAt: v.performedAt,
    unit: 'g' as const,
    points: v.points.map((p) => ({ load: Number(p.load), indication: Number(p.indication), testWeightIds: p.testWeightIds })),
    repeatability: v.withRepeatability ? series(v.repeatability) : null,
    eccentricity: v.withEccentricity ? series(v.eccentricity) : null,
    zeroOk: v.zeroOk,
    tareOk: v.tareOk,
    intervalDays: Number(v.intervalDays),
    notes: v.notes.trim() || null,
  };
}
