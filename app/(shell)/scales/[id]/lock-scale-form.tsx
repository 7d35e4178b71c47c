'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import { apiFetch } from '../../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../../_components/confirm-bar';
import { toFormikErrors } from '../../../_components/field-errors';
import { FormField, FormMessage } from '../../../_components/form-field';

const schema = yup.object({
  reason: yup.string().trim().min(5, 'Say why the scale is locked').max(300, 'At most 300 characters').required('Say why the scale is locked'),
});

// A hand lock-out (dropped, damaged, suspect readings). Only a passing test lifts it.
export function LockScaleForm({ scaleId, locked }: { scaleId: number; locked: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState<PendingConfirm | null>(null);
  return (
    <Formik
      initialValues={{ reason: '' }}
      validationSchema={schema}
      // A valid reason first asks once more, saying what the lock-out does; then it is sent.
      onSubmit={(values, helpers) => {
        setMessage(null);
        setPending({
          question: locked
            ? `Change the reason to "${values.reason.trim()}"? The scale stays locked.`
            : `Lock out this scale? No one can capture counts on it until a passing test is recorded. Reason: "${values.reason.trim()}".`,
          yes: locked ? 'Yes, change the reason' : 'Yes, lock it out',
          onConfirm: async () => {
            const res = await apiFetch(`/api/v1/scales/${scaleId}/lock`, { method: 'POST', body: values });
            if (!res.ok) {
              helpers.setErrors(toFormikErrors(res.fields));
              setMessage(res.message);
              return;
            }
            helpers.resetForm();
            router.refresh();
          },
        });
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card space-y-3 border-fault/40" aria-label="Lock out this scale">
          <h2 className="font-bold">{locked ? 'Change the lock-out reason' : 'Lock out this scale'}</h2>
          <p className="text-sm text-ink-soft">No one can capture counts on a locked scale. It returns to service when a passing test is recorded.</p>
          <FormField name="reason" label="Reason" autoComplete="off" placeholder="e.g. dropped while moving the bench" />
          <FormMessage message={message} />
          <button type="submit" className="btn-danger" disabled={isSubmitting || pending !== null}>
            Lock out…
          </button>
          <ConfirmBar pending={pending} onDone={() => setPending(null)} />
        </ReadyForm>
      )}
    </Formik>
  );
}
