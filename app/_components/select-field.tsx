'use client';

import { useField } from 'formik';
import type { ReactNode, SelectHTMLAttributes } from 'react';

type Props = SelectHTMLAttributes<HTMLSelectElement> & { name: string; label: ReactNode; hint?: ReactNode; options: ReadonlyArray<readonly [string, string]> };

// The select counterpart of FormField: labelled, with its error announced beside it.
export function SelectField({ label, hint, options, ...props }: Props) {
  const [field, meta] = useField(props.name);
  const id = props.id ?? `f-${props.name}`;
  const showError = meta.touched && meta.error;
  const describedBy = [hint ? `${id}-hint` : null, showError ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select {...field} {...props} id={id} className="field" aria-invalid={showError ? true : undefined} aria-describedby={describedBy}>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      {hint ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
      <p id={`${id}-error`} className="field-error" aria-live="polite">
        {showError ? meta.error : null}
      </p>
    </div>
  );
}
