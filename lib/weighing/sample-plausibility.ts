/**
 * Whether a weighed sample can teach a part anything (docs/counting-model.md, "Samples that teach").
 * A sample the scale cannot have weighed is refused; one far from the part's history is kept but
 * held until someone accountable accepts it, so one bad sample cannot poison a part.
 */

export interface SampleScale {
  /** Division d (g). */
  division: number;
  /** Max (g). */
  max: number;
  /** Min (g); 0 when none. */
  min: number;
}

export interface SampleProblem {
  field: 'quantity' | 'netWeight';
  message: string;
}

const grams = (x: number): string => `${Number(x.toPrecision(4))} g`;

/** What makes a sample impossible on this scale; empty when it is plausible. */
export function sampleProblems(sample: { quantity: number; netWeight: number }, scale: SampleScale): SampleProblem[] {
  const problems: SampleProblem[] = [];
  const apw = sample.netWeight / sample.quantity;
  if (sample.netWeight > scale.max) {
    problems.push({ field: 'netWeight', message: `${grams(sample.netWeight)} is over this scale's Max of ${grams(scale.max)}` });
  } else if (sample.netWeight < scale.min) {
    problems.push({
      field: 'netWeight',
      message: `${grams(sample.netWeight)} is under this scale's Min of ${grams(scale.min)}: put more pieces on, or use a finer scale`,
    });
  }
  // A piece lighter than one division cannot be told apart: the quantity does not fit the weight.
  if (!(apw >= scale.division)) {
    problems.push({
      field: 'quantity',
      message: `${sample.quantity} pieces in ${grams(sample.netWeight)} would weigh ${grams(apw)} each, less than this scale's division of ${grams(scale.division)}: check the quantity, or use a finer scale`,
    });
  }
  return problems;
}

export interface PastSample {
  quantity: number;
  averagePieceWeight: number;
}

export interface OutlierInput {
  quantity: number;
  averagePieceWeight: number;
  /** Variance of the new sample's net weight (g²). */
  netVariance: number;
  /** Accepted samples of the part. */
  history: readonly PastSample[];
  /** c² to allow for (a cautious value: the spread belief's upper percentile). */
  c2: number;
}

/** How many standard deviations from the history a sample may sit before it is held (our choice: rare by chance, 6e-5). */
export const HOLD_SIGMAS: number = 4;

export interface OutlierResult {
  held: boolean;
  /** (APW − history mean) in standard deviations of the expected difference. */
  sigmas: number;
  historyMean: number | null;
}

/**
 * The four-sigma history test. The new APW differs from the history's n-weighted mean ā by
 * piece scatter c²·(1/n + 1/Σn_i), its own weighing u(W_s)²/W_s², and lot-to-lot drift, taken
 * as the history's own n-weighted relative scatter; beyond 4 standard deviations it is held.
 */
export function historyOutlier(input: OutlierInput): OutlierResult {
  const history = input.history.filter((s) => s.quantity > 0 && s.averagePieceWeight > 0);
  if (history.length === 0) return { held: false, sigmas: 0, historyMean: null };
  const total = history.reduce((sum, s) => sum + s.quantity, 0);
  const mean = history.reduce((sum, s) => sum + s.quantity * s.averagePieceWeight, 0) / total;
  const drift =
    history.length < 2
      ? 0
      : history.reduce((sum, s) => sum + (s.quantity / total) * (s.averagePieceWeight / mean - 1) ** 2, 0) * (history.length / (history.length - 1));
  const weighing = input.netVariance / (input.quantity * input.averagePieceWeight) ** 2;
  const variance = input.c2 * (1 / input.quantity + 1 / total) + weighing + drift;
  const sigmas = Math.abs(input.averagePieceWeight / mean - 1) / Math.sqrt(variance);
  return { held: sigmas > HOLD_SIGMAS, sigmas, historyMean: mean };
}
