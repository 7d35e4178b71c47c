'use client';

import { Form, Formik } from 'formik';
import { useRef, useState } from 'react';
import * as yup from 'yup';
import type { PendingVariance } from '@/server/services/bins/pending-variances';
import { apiFetch } from '../../../_components/api-client';
import { toFormikErrors } from '../../../_components/field-errors';
import { FormField, FormMessage } from '../../../_components/form-field';

const schema = yup.object({ note: yup.string().max(200, 'At most 200 characters') });

// One note, two ways out: the button pressed decides.
export function VarianceDecision({ variance, onDecided }: { variance: PendingVariance; onDecided: (notice: string) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  // A ref, not state: it is set by the click and read by the submit that the same click starts.
  const decision = useRef<'approve' | 'reject'>('approve');
  return (
    <Formik
      initialValues={{ note: '' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const res = await apiFetch<{ binCount: { binCode: string; bookQuantity: number } }>(`/api/v1/bin-counts/${variance.id}/decision`, { method: 'POST', body: { decision: decision.current, note: values.note.trim() || null } });
        if (!res.ok) {
          helpers.setErrors(toFormikErrors(res.fields));
          setMessage(res.message);
          return;
        }
        const b = res.data.binCount;
        onDecided(decision.current === 'approve' ? `${b.binCode}: approved, book quantity now ${b.bookQuantity}.` : `${b.binCode}: rejected, the book stays at ${b.bookQuantity}; count the bin again.`);
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="space-y-2" aria-label={`Decide on ${variance.binCode}`}>
          <FormField name="note" id={`note-${variance.id}`} label="Note (optional)" autoComplete="off" placeholder="e.g. found a torn bag" />
          <FormMessage message={message} />
          <div className="flex flex-wrap gap-2">
            <button type="submit" className="btn-primary" disabled={isSubmitting} onClick={() => (decision.current = 'approve')}>Approve</button>
            <button type="submit" className="btn-danger" disabled={isSubmitting} onClick={() => (decision.current = 'reject')}>Reject</button>
          </div>
        </Form>
      )}
    </Formik>
  );
}
