// Picks the X dimension (narrowest bar or module) for a symbol: the largest allowed size at which the
// symbol and its quiet zones fit the space. Larger modules scan from further away and forgive print gain.
export interface FitModuleInput {
  modules: number;
  quietModules: number; // each side
  available: number; // points
  candidates: readonly number[]; // points, any order
}

export function fitModule({ modules, quietModules, available, candidates }: FitModuleInput): number | null {
  if (modules <= 0 || quietModules < 0) throw new RangeError('modules must be positive and quiet zones not negative');
  const total = modules + 2 * quietModules;
  const fitting = candidates.filter((x) => x > 0 && total * x <= available);
  return fitting.length ? Math.max(...fitting) : null;
}

// Quiet zones, in modules, each side of the symbol.
export const QUIET_ZONE = {
  // ISO/IEC 15417 (Code 128), and GS1 General Specifications for GS1-128: at least 10 X.
  code128: 10,
  // ISO/IEC 18004 (QR Code): 4 X (from memory).
  qrcode: 4,
  // ISO/IEC 16022 (Data Matrix): 1 X is the minimum (from memory); 2 X gives decoders more room.
  datamatrix: 2,
} as const;
