/**
 * What the bench counts. Parts are the first source; a kitting queue (build-order lines, bins)
 * plugs in as another WorkSource producing the same items.
 */
export type WorkPurpose = 'part' | 'bin' | 'kit_line';

export interface ToleranceBand {
  /** Pieces allowed below the target. */
  below: number;
  /** Pieces allowed above the target. */
  above: number;
}

/** What a capture fills besides the count itself: a build-order line, or a bin at a known version. */
export interface WorkTarget {
  orderLineId: number | null;
  binId: number | null;
  binVersion: number | null;
}

export interface WorkItem extends Partial<WorkTarget> {
  purpose: WorkPurpose;
  partId: number;
  partNumber: string;
  label: string;
  /** Unique within one list (a part may sit on several order lines or bins). */
  key: string;
  targetQuantity?: number;
  tolerance?: ToleranceBand;
}

export interface WorkSource {
  readonly id: string;
  readonly title: string;
  search(query: string): Promise<WorkItem[]>;
  /** A scanned code that names exactly one item, or null. */
  resolveScan(code: string): Promise<WorkItem | null>;
}

/** Parts counted on the pan with their sample (part) or weighed in a container apart (bin). */
export function sampleStaysOnPan(purpose: WorkPurpose): boolean {
  return purpose !== 'bin';
}
