/**
 * Tallyforge bin location codes: ZONE-RACK-SHELF-SLOT, e.g. "K-04-2-07".
 * Zone: 1–2 letters; rack: 2 digits (01–99); shelf: 1 digit (1–9, counted from the floor);
 * slot: 2 digits (01–99, counted from the left). Upper-case, so scanned and typed codes match.
 */
export interface BinLocation {
  zone: string;
  rack: number;
  shelf: number;
  slot: number;
}

const PATTERN = /^([A-Z]{1,2})-(\d{2})-([1-9])-(\d{2})$/;

export function parseBinCode(text: string): BinLocation | null {
  const match = PATTERN.exec(text.trim().toUpperCase());
  if (!match) return null;
  const [, zone, rack, shelf, slot] = match;
  const location = { zone, rack: Number(rack), shelf: Number(shelf), slot: Number(slot) };
  return location.rack >= 1 && location.slot >= 1 ? location : null;
}

export function formatBinCode({ zone, rack, shelf, slot }: BinLocation): string {
  return `${zone}-${String(rack).padStart(2, '0')}-${shelf}-${String(slot).padStart(2, '0')}`;
}

export const BIN_CODE_HINT = 'ZONE-RACK-SHELF-SLOT, e.g. K-04-2-07';
