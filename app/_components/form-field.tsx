'use client';

import { useField } from 'formik';
import type { InputHTMLAttributes, ReactNode } from 'react';

type Props = InputHTMLAttributes<HTMLInputElement> & { name: string; label: ReactNode; hint?: ReactNode };

// A labelled Formik field whose error is announced to screen readers.
export function FormField({ label, hint, ...props }: Props) {
  const [field, meta] = useField(props.name);
  const id = props.id ?? `f-${props.name}`;
  const showError = meta.touched && meta.error;
  const describedBy = [hint ? `${id}-hint` : null, showError ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <input {...field} {...props} id={id} className="field" aria-invalid={showError ? true : undefined} aria-describedby={describedBy} />
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

export function FormMessage({ message }: { message: string | null }) {
  return (
    <p role="status" aria-live="polite" className={message ? 'rounded-md bg-fault-light px-3 py-2 text-sm text-fault' : 'sr-only'}>
      {message}
    </p>
  );
}
