'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import type { OrderDto } from '@/lib/contracts/orders';
import { apiFetch } from '../../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../../_components/confirm-bar';

const reason = yup.string().trim().min(10, 'Say in a sentence why the order is complete anyway').max(500, 'At most 500 characters');
const optionalReason = yup.object({ overrideReason: reason });
const neededReason = yup.object({ overrideReason: reason.required('Needed while lines are not in tolerance') });

// Release, cancel and complete; the server's answer is shown beside the buttons.
export function OrderActions({ order, onChanged }: { order: OrderDto; onChanged: (o: OrderDto) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [pending, setPending] = useState<PendingConfirm | null>(null);
  const notIn = order.lines.filter((l) => l.verdict !== 'in').length;

  async function act(action: 'release' | 'cancel' | 'complete', extra: Record<string, unknown> = {}): Promise<Record<string, string>> {
    setBusy(true);
    setMessage(null);
    const res = await apiFetch<{ order: OrderDto }>(`/api/v1/orders/${order.id}/${action}`, { method: 'POST', body: { version: order.version, ...extra } });
    setBusy(false);
    if (res.ok) {
      onChanged(res.data.order);
      return {};
    }
    setMessage(res.message);
    return res.fields;
  }

  const open = order.status === 'released' || order.status === 'in_progress';
  if (order.status === 'complete' || order.status === 'cancelled') return null;
  return (
    <section className="card space-y-3" aria-labelledby="actions-title">
      <h2 id="actions-title" className="font-bold">
        What next
      </h2>
      <div className="flex flex-wrap gap-3 items-center">
        {order.status === 'draft' ? (
          <button type="button" className="btn-primary" disabled={busy} onClick={() => act('release')}>
            Release to the bench
          </button>
        ) : null}
        <button
          type="button"
          className="btn-danger"
          disabled={busy}
          onClick={() =>
            setPending({
              question:
                order.status === 'draft'
                  ? `Cancel draft ${order.number}? It will not be released or built.`
                  : `Cancel ${order.number}? Its reserved stock goes back to free stock; captures already made stay on record, and the kits are not built.`,
              yes: order.status === 'draft' ? 'Yes, cancel the draft' : 'Yes, cancel and free the stock',
              onConfirm: () => void act('cancel'),
            })
          }
        >
          {order.status === 'draft' ? 'Cancel draft' : 'Cancel order and free its stock'}
        </button>
      </div>
      <ConfirmBar pending={pending} onDone={() => setPending(null)} />
      {open ? (
        <Formik
          initialValues={{ overrideReason: '' }}
          validationSchema={notIn ? neededReason : optionalReason}
          onSubmit={async (values, helpers) => {
            const fields = await act('complete', values.overrideReason.trim() ? { overrideReason: values.overrideReason.trim() } : {});
            if (fields.overrideReason) helpers.setFieldError('overrideReason', fields.overrideReason);
          }}
        >
          {({ errors, touched, getFieldProps }) => (
            <ReadyForm noValidate className="space-y-2" aria-label="Complete the order">
              {notIn ? (
                <div>
                  <label htmlFor="f-overrideReason" className="field-label">
                    {notIn} line{notIn === 1 ? ' is' : 's are'} not in tolerance. To complete anyway, say why
                  </label>
                  <textarea
                    id="f-overrideReason"
                    className="field py-2 min-h-20"
                    {...getFieldProps('overrideReason')}
                    aria-describedby="f-overrideReason-error"
                    aria-invalid={touched.overrideReason && errors.overrideReason ? true : undefined}
                  />
                  <p id="f-overrideReason-error" className="field-error" aria-live="polite">
                    {touched.overrideReason ? errors.overrideReason : null}
                  </p>
                </div>
              ) : (
                <p className="text-ok">Every line is in tolerance.</p>
              )}
              <button type="submit" className={notIn ? 'btn-quiet' : 'btn-primary'} disabled={busy}>
                {notIn ? 'Complete with this reason' : 'Complete the order'}
              </button>
            </ReadyForm>
          )}
        </Formik>
      ) : null}
      <p
        role="alert"
        aria-live="assertive"
        className={message ? 'rounded-md bg-fault-light px-3 py-2 text-sm text-fault' : 'sr-only'}
        data-testid="order-action-message"
      >
        {message}
      </p>
    </section>
  );
}
