// Safety and legal notes shown wherever weighing results are used.
export function Cautions({ compact = false }: { compact?: boolean }) {
  return (
    <section aria-labelledby="cautions-title" className="rounded-lg border border-caution/40 bg-caution-light/60 p-4 text-sm">
      <h2 id="cautions-title" className="font-bold text-caution">
        Before you rely on a count
      </h2>
      <ul className={`mt-2 list-disc pl-5 space-y-1 [&>li]:break-inside-avoid ${compact ? '' : 'lg:columns-2 lg:gap-8'}`}>
        <li>
          Never load a scale beyond its capacity (Max). Lift heavy bins and totes with a second person or a hoist; about 23 kg is the usual upper limit for one
          person lifting in good conditions.
        </li>
        <li>
          Counts used to sell, bill or ship by quantity need a scale verified for legal trade in your country. Tallyforge's uncertainty figures do not replace
          that verification.
        </li>
        <li>Your local weights-and-measures authority and your shop's quality system have the final word on scales, test weights and tolerances.</li>
      </ul>
    </section>
  );
}
