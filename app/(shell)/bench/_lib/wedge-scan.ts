/**
 * Tells a keyboard-wedge scanner from a person typing: a scanner types a whole code as a fast burst
 * of keys (a few milliseconds apart) ending in Enter; people leave far longer gaps (common practice:
 * scanners send 5–20 ms a key, typists rarely under 60 ms).
 */

/** Longest gap between two keys of one scan (our choice, between the two). */
export const MAX_SCAN_GAP_MS = 40;
/** Shortest code taken as a scan: bin codes and part numbers are longer. */
export const MIN_SCAN_LENGTH = 4;

export interface WedgeDetector {
  /** Feed every key press; returns the scanned code when this Enter closes a fast burst, else null. */
  key(key: string, t: number): string | null;
}

export function createWedgeDetector(maxGapMs = MAX_SCAN_GAP_MS, minLength = MIN_SCAN_LENGTH): WedgeDetector {
  let burst = '';
  let last = -Infinity;
  return {
    key(key, t) {
      const fast = t - last <= maxGapMs;
      last = t;
      if (key === 'Enter') {
        const code = fast && burst.length >= minLength ? burst : null;
        burst = '';
        return code;
      }
      if (key.length !== 1) {
        burst = '';
        return null;
      }
      burst = fast ? burst + key : key;
      return null;
    },
  };
}

/**
 * What the scan field should hold once a scan ends: the scanned code alone, even where the field
 * already held text (a second scan replaces the first instead of running on after it).
 */
export function afterScan(fieldValue: string, scanned: string): string {
  return fieldValue.endsWith(scanned) ? scanned : fieldValue;
}
