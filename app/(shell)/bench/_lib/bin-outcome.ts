/** What the bench tells a clerk after a bin count: booked, held for a decision, or nothing to change. */

export interface BinOutcomeInput {
  bookQuantity: number;
  counted: number;
  variance: number;
  status: string;
  /** The count's ± whole pieces (0 when exact). */
  wholePieceRange: number;
}

export interface BinOutcome {
  tone: 'ok' | 'info' | 'caution';
  text: string;
}

const signed = (n: number): string => (n > 0 ? `+${n}` : `${n}`);

export function describeBinOutcome(o: BinOutcomeInput): BinOutcome {
  const counted = o.wholePieceRange === 0 ? `${o.counted} (exact)` : `${o.counted} ± ${o.wholePieceRange}`;
  if (o.status === 'pending') {
    return {
      tone: 'caution',
      text: `Held for a decision: counted ${counted} against a book of ${o.bookQuantity} (${signed(o.variance)}), beyond the site's limits. A planner or quality engineer decides it on the Variances page; until then the book stays at ${o.bookQuantity}.`,
    };
  }
  if (o.variance === 0) return { tone: 'ok', text: `Nothing to change: counted ${counted}, the same as the book.` };
  // Within the count's own range the difference may be the weighing's, not the bin's.
  const within =
    Math.abs(o.variance) <= o.wholePieceRange
      ? ` The difference is within the count's own ± ${o.wholePieceRange}, so it may be the weighing's rather than the bin's.`
      : '';
  return {
    tone: within ? 'caution' : 'ok',
    text: `Booked: the bin now holds ${o.counted} (book was ${o.bookQuantity}, ${signed(o.variance)}); counted ${counted}.${within}`,
  };
}
