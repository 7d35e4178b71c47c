// Fits a text run into its width: codes shrink (a cut-short code would be a wrong code); free text
// keeps its size and ends in an ellipsis. `measure` gives the width of a text at a size, in points.
export type Measure = (text: string, size: number) => number;

export function fitText(
  text: string,
  { size, maxWidth, overflow }: { size: number; maxWidth: number; overflow: 'shrink' | 'ellipsis' },
  measure: Measure,
): { text: string; size: number } {
  const width = measure(text, size);
  if (width <= maxWidth) return { text, size };
  if (overflow === 'shrink') return { text, size: (size * maxWidth) / width };
  // Longest prefix that fits with the ellipsis: widths only grow with length, so search by halves.
  let lo = 0;
  let hi = text.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (measure(`${text.slice(0, mid).trimEnd()}…`, size) <= maxWidth) lo = mid;
    else hi = mid - 1;
  }
  return { text: lo ? `${text.slice(0, lo).trimEnd()}…` : '', size };
}
