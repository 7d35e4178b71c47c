// Shown with every calibration view: our records support a quality system, they are not legal verification.
export function TradeCaution() {
  return (
    <aside className="rounded-lg border border-caution/40 bg-caution-light/60 p-4 text-sm" aria-label="Legal use of scales">
      <p className="font-bold text-caution">Calibration records here are not legal verification</p>
      <p className="mt-1">
        A scale used to sell, bill or ship by quantity needs verification for trade where you are. Your local weights-and-measures authority decides which
        tolerances, test weights and intervals apply; the OIML R 76 and NIST Handbook 44 limits shown here are the published defaults.
      </p>
    </aside>
  );
}
