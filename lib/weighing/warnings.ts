/** Counting warnings: stable codes from docs/counting-model.md with our own plain wording and remedy. */

export const WARNING_CODES = [
  'apw_below_resolution',
  'below_min_capacity',
  'count_not_exact',
  'sample_too_small',
  'over_capacity',
  'cv_assumed',
  'single_piece_not_resolved',
  'not_whole_pieces',
  'unstable',
  'scale_locked',
] as const;

export type WarningCode = (typeof WARNING_CODES)[number];

export interface CountingWarning {
  code: WarningCode;
  message: string;
}

export interface WarningText {
  short: string; // a few words, for lists and logs
  message: string;
  remedy: string;
}

export const WARNING_TEXT: Readonly<Record<WarningCode, WarningText>> = {
  apw_below_resolution: {
    short: 'piece below division',
    message: 'One piece weighs less than the smallest step this scale shows.',
    remedy: 'Use a scale with a finer division, or count these parts by hand.',
  },
  below_min_capacity: {
    short: 'below Min',
    message: 'The load is lighter than the smallest load this scale is rated for, so its error may be large.',
    remedy: 'Put more pieces on the pan, or weigh on a smaller, finer scale.',
  },
  count_not_exact: {
    short: 'not exact',
    message: 'The count could be off by one piece or more; it is shown with its ± range.',
    remedy: 'Grow the sample, count in smaller batches, or use a finer scale.',
  },
  sample_too_small: {
    short: 'sample too small',
    message: 'With this sample the target quantity cannot be counted exactly.',
    remedy: 'Grow the sample in steps, use a finer scale, or count the rest by hand.',
  },
  over_capacity: {
    short: 'over capacity',
    message: 'The load is above what this scale can weigh.',
    remedy: 'Take some pieces off and weigh them in batches, or use a larger scale.',
  },
  cv_assumed: {
    short: 'spread assumed',
    message:
      'How much single pieces vary is not yet known for this part, so a cautious value is assumed: counts show wider ranges than they will once it is learned.',
    remedy: 'Put the first pieces of a sample on one at a time, so the app learns this part.',
  },
  single_piece_not_resolved: {
    short: 'one piece not resolved',
    message: 'On this scale not even one piece can be told apart from the weighing noise, so no count here is exact.',
    remedy: 'Use a scale with a finer division, or count these parts by hand.',
  },
  not_whole_pieces: {
    short: 'not whole pieces',
    message: 'The weight fits no whole number of these pieces: something else may be on the pan, a wrong part, or a tare that went wrong.',
    remedy: 'Check the pan and the part, tare again, and count once more.',
  },
  unstable: {
    short: 'unstable',
    message: 'The reading is still moving, so it was not taken.',
    remedy: 'Wait until the pan is still, keep hands and air draughts off it, and try again.',
  },
  scale_locked: {
    short: 'scale locked',
    message: 'This scale is out of calibration or locked, so its readings cannot be used.',
    remedy: 'Use another scale, or ask quality to calibrate and release this one.',
  },
};

export function makeWarning(code: WarningCode): CountingWarning {
  return { code, message: WARNING_TEXT[code].message };
}

export function describeWarning(code: WarningCode): WarningText {
  return WARNING_TEXT[code];
}

export function isWarningCode(value: unknown): value is WarningCode {
  return typeof value === 'string' && (WARNING_CODES as readonly string[]).includes(value);
}
