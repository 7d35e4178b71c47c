import type { CountPurpose } from './domain/counting';

// What each kind of capture was for, in the words the pages use.
export const COUNT_PURPOSE_LABELS: Readonly<Record<CountPurpose, string>> = {
  kit_line: 'Kit line',
  bin: 'Bin count',
  part: 'Part count',
  audit: 'Audit recount',
};
