'use client';

import { useField } from 'formik';
import type { TestWeightDto } from '@/lib/contracts/calibration';
import { formatGrams } from '../../../_components/format';

// The weights that made up one test load; the running total is shown against the load.
export function TestWeightPicker({ name, load, weights, mpe }: { name: string; load: number; weights: TestWeightDto[]; mpe: number | null }) {
  const [field, meta, helpers] = useField<number[]>(name);
  const chosen = weights.filter((w) => field.value.includes(w.id));
  const total = chosen.reduce((a, w) => a + w.nominal, 0);
  const weightsMpeG = chosen.reduce((a, w) => a + (w.mpeMg ?? Infinity), 0) / 1000;
  const toggle = (id: number) => helpers.setValue(field.value.includes(id) ? field.value.filter((x) => x !== id) : [...field.value, id]);
  const errorId = `${name}-error`;
  return (
    <fieldset aria-describedby={errorId}>
      <legend className="field-label">Test weights for {formatGrams(load)}</legend>
      <div className="flex flex-wrap gap-1.5">
        {weights.map((w) => (
          <label
            key={w.id}
            className={`inline-flex min-h-9 cursor-pointer items-center gap-1.5 rounded-md border px-2 text-sm ${field.value.includes(w.id) ? 'border-forge bg-forge-light' : 'border-paper-line bg-white'}`}
          >
            <input type="checkbox" checked={field.value.includes(w.id)} onChange={() => toggle(w.id)} onBlur={() => helpers.setTouched(true)} />
            <span className="num">{w.identifier}</span>
            <span className="text-ink-faint">
              {formatGrams(w.nominal)} {w.weightClass}
              {w.overdue ? ' · overdue' : ''}
            </span>
          </label>
        ))}
      </div>
      <p className={`mt-1 text-xs ${chosen.length && Math.abs(total - load) > 1e-9 ? 'text-caution' : 'text-ink-faint'}`}>
        {chosen.length ? `Chosen weights add up to ${formatGrams(total)}` : 'None chosen yet'}
        {chosen.length && mpe !== null
          ? `; their MPE ${Math.round(weightsMpeG * 1e6) / 1000} mg ${weightsMpeG <= mpe / 3 ? 'is within' : 'exceeds'} 1/3 of the scale's MPE (OIML R 111 Table 1, R 76-1 3.7.1)`
          : ''}
      </p>
      <p id={errorId} className="field-error" aria-live="polite">
        {meta.touched && typeof meta.error === 'string' ? meta.error : null}
      </p>
    </fieldset>
  );
}
