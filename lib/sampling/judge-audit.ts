export interface AuditedCount {
  count: number;
  /** The count's own ± whole pieces at 95 % (0 when exact). */
  wholePieceRange: number;
  exact: boolean;
  handCount: number;
}

export interface ItemVerdict {
  error: number;
  /** The hand count lies inside the count's own stated range count ± wholePieceRange. */
  withinUncertainty: boolean;
  /** For counts flagged exact: whether they were exactly right; null otherwise. */
  exactRight: boolean | null;
}

// An item is nonconforming when the scale's count claimed more certainty than it had.
export function judgeAuditItem(c: AuditedCount): ItemVerdict {
  const error = c.count - c.handCount;
  return {
    error,
    withinUncertainty: Math.abs(error) <= c.wholePieceRange,
    exactRight: c.exact ? error === 0 : null,
  };
}

/** ISO 2859-1 single sampling: accept the lot when nonconforming items ≤ Ac, reject at Re or more. */
export function judgeLot(defects: number, accept: number): 'accepted' | 'rejected' {
  return defects <= accept ? 'accepted' : 'rejected';
}
