import { describeWarning, WARNING_CODES, type WarningCode } from '@/lib/weighing/warnings';

// How to make each warning appear on the practice pan, so operators learn them before they meet them.
const RECIPES: Record<WarningCode, string> = {
  apw_below_resolution: 'Set the practice piece weight below the scale division d.',
  below_min_capacity: 'Take a sample lighter than the scale’s Min.',
  count_not_exact: 'Take a sample of 10, skip growing, and put hundreds of pieces on.',
  sample_too_small: 'Give a large target, then take a small sample.',
  over_capacity: 'Put on more than the capacity Max.',
  cv_assumed: 'Count a part whose piece spread has not been learned yet.',
  single_piece_not_resolved: 'Set the practice piece weight to about one and a half divisions d.',
  not_whole_pieces: 'After sampling, put the container or half a piece’s weight of something else on the pan.',
  unstable: 'Press a step right after putting pieces on, before the weight settles.',
  scale_locked: 'Choose a scale that quality has locked out.',
};

export function WarningRecipes() {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer py-2 font-medium text-forge">Try each warning on the practice pan</summary>
      <ul className="mt-1 space-y-2">
        {WARNING_CODES.map((code) => (
          <li key={code}>
            <span className="font-medium">{describeWarning(code).message}</span>
            <span className="block text-ink-soft">{RECIPES[code]}</span>
          </li>
        ))}
      </ul>
    </details>
  );
}
