'use client';

import { useState } from 'react';
import { AQLS, samplingPlan, type Aql, type InspectionLevel } from '@/lib/sampling/iso2859';

export const LEVELS: InspectionLevel[] = ['I', 'II', 'III'];

// Same tables the server uses, computed in the browser as you type.
export function SamplingPlanCalculator() {
  const [lot, setLot] = useState('500');
  const [level, setLevel] = useState<InspectionLevel>('II');
  const [aql, setAql] = useState<Aql>(1);
  const lotSize = Number(lot);
  const valid = Number.isInteger(lotSize) && lotSize >= 2 && lotSize <= 100_000_000;
  const plan = valid ? samplingPlan(lotSize, aql, level) : null;
  return (
    <section aria-labelledby="plan-title" className="card space-y-4">
      <h2 id="plan-title" className="font-bold">
        Sampling plan
      </h2>
      <div className="grid gap-4 grid-cols-3">
        <div>
          <label htmlFor="plan-lot" className="field-label">
            Lot size (counts)
          </label>
          <input
            id="plan-lot"
            className="field num"
            inputMode="numeric"
            value={lot}
            onChange={(e) => setLot(e.target.value)}
            aria-describedby="plan-lot-error"
          />
          <p id="plan-lot-error" className="field-error" aria-live="polite">
            {valid ? null : 'A whole number of at least 2'}
          </p>
        </div>
        <div>
          <label htmlFor="plan-level" className="field-label">
            Inspection level
          </label>
          <select id="plan-level" className="field" value={level} onChange={(e) => setLevel(e.target.value as InspectionLevel)}>
            {LEVELS.map((l) => (
              <option key={l} value={l}>
                {l}
                {l === 'II' ? ' (usual)' : ''}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="plan-aql" className="field-label">
            AQL (%)
          </label>
          <select id="plan-aql" className="field" value={aql} onChange={(e) => setAql(Number(e.target.value) as Aql)}>
            {AQLS.map((a) => (
              <option key={a} value={a}>
                {a}
              </option>
            ))}
          </select>
        </div>
      </div>
      {plan ? (
        <dl className="grid grid-cols-2 sm:grid-cols-4 gap-3" data-testid="sampling-plan">
          {[
            ['Code letter', plan.codeLetter],
            ['Sample size n', String(plan.sampleSize)],
            ['Accept (Ac)', `≤ ${plan.accept}`],
            ['Reject (Re)', `≥ ${plan.reject}`],
          ].map(([k, v]) => (
            <div key={k} className="rounded-md bg-paper-deep px-3 py-2">
              <dt className="text-xs text-ink-soft">{k}</dt>
              <dd className="num text-2xl font-bold">{v}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {plan?.inspectAll ? <p className="text-sm text-caution">The sample reaches the whole lot: recount every item.</p> : null}
      <p className="text-xs text-ink-faint">
        Normal inspection, single sampling: code letters from ISO 2859-1 Table 1, n and Ac/Re from Table 2-A, following its arrows. Nonconforming counts are
        those whose hand count lies outside count ± U.
      </p>
    </section>
  );
}
