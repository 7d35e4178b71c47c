'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRef, useState } from 'react';
import * as yup from 'yup';
import type { PendingVariance } from '@/lib/contracts/bins';
import { apiFetch } from '../../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../../_components/confirm-bar';
import { toFormikErrors } from '../../../_components/field-errors';
import { FormField, FormMessage } from '../../../_components/form-field';

const schema = yup.object({ note: yup.string().max(200, 'At most 200 characters') });

// One note, two ways out: the button pressed decides.
export function VarianceDecision({ variance, onDecided }: { variance: PendingVariance; onDecided: (notice: string) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  // A ref, not state: it is set by the click and read by the submit that the same click starts.
  const decision = useRef<'approve' | 'reject'>('approve');
  const [pending, setPending] = useState<PendingConfirm | null>(null);
  // Each way out says what it does to the book before it is taken.
  const ask = (d: 'approve' | 'reject', submit: () => Promise<void>) => {
    decision.current = d;
    const v = variance.variance > 0 ? `+${variance.variance}` : `${variance.variance}`;
    setPending(
      d === 'approve'
        ? {
            question: `Approve ${v} pcs on ${variance.binCode}? Its book quantity becomes ${variance.counted} (from ${variance.bookQuantity}).`,
            yes: 'Yes, approve',
            onConfirm: submit,
          }
        : {
            question: `Reject the count of ${variance.binCode}? The book stays at ${variance.bookQuantity} and the bin should be counted again.`,
            yes: 'Yes, reject',
            onConfirm: submit,
          },
    );
  };
  return (
    <Formik
      initialValues={{ note: '' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const res = await apiFetch<{ binCount: { binCode: string; bookQuantity: number } }>(`/api/v1/bin-counts/${variance.id}/decision`, {
          method: 'POST',
          body: { decision: decision.current, note: values.note.trim() || null },
        });
        if (!res.ok) {
          helpers.setErrors(toFormikErrors(res.fields));
          setMessage(res.message);
          return;
        }
        const b = res.data.binCount;
        onDecided(
          decision.current === 'approve'
            ? `${b.binCode}: approved, book quantity now ${b.bookQuantity}.`
            : `${b.binCode}: rejected, the book stays at ${b.bookQuantity}; count the bin again.`,
        );
      }}
    >
      {({ isSubmitting, submitForm }) => (
        <ReadyForm noValidate className="space-y-2" aria-label={`Decide on ${variance.binCode}`}>
          <FormField name="note" id={`note-${variance.id}`} label="Note (optional)" autoComplete="off" placeholder="e.g. found a torn bag" />
          <FormMessage message={message} />
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-primary" disabled={isSubmitting || pending !== null} onClick={() => ask('approve', submitForm)}>
              Approve
            </button>
            <button type="button" className="btn-danger" disabled={isSubmitting || pending !== null} onClick={() => ask('reject', submitForm)}>
              Reject
            </button>
          </div>
          <ConfirmBar pending={pending} onDone={() => setPending(null)} tone={decision.current === 'approve' ? 'primary' : 'danger'} />
        </ReadyForm>
      )}
    </Formik>
  );
}
