'use client';

import { Field, Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import type { OrderDto } from '@/lib/contracts/orders';
import { apiFetch } from '../../_components/api-client';
import { useRequestKey } from '../../_components/request-key';
import { FormField, FormMessage } from '../../_components/form-field';

export interface KitChoice {
  id: number;
  label: string;
  components: number;
}

const schema = yup.object({
  kitId: yup.number().typeError('Pick a kit revision').integer().positive('Pick a kit revision').required('Pick a kit revision'),
  quantity: yup
    .number()
    .typeError('A whole number of kits')
    .integer('A whole number of kits')
    .min(1, 'At least 1 kit')
    .max(100_000, 'At most 100 000 kits per order')
    .required('Number of kits is required'),
  dueDate: yup.string().matches(/^(\d{4}-\d{2}-\d{2})?$/, 'A date, e.g. 2026-12-20'),
});

export function OrderCreateForm({ kits }: { kits: KitChoice[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const requestKey = useRequestKey();
  return (
    <Formik
      initialValues={{ kitId: '', quantity: '', dueDate: '' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const body = { kitId: Number(values.kitId), quantity: Number(values.quantity), dueDate: values.dueDate || null };
        const res = await apiFetch<{ order: OrderDto }>('/api/v1/orders', { method: 'POST', body, headers: { 'Idempotency-Key': requestKey.keyFor(body) } });
        if (res.ok) {
          requestKey.done();
          router.push(`/orders/${res.data.order.id}`);
          return;
        }
        helpers.setErrors(res.fields);
        setMessage(res.message);
      }}
    >
      {({ isSubmitting, errors, touched }) => (
        <ReadyForm noValidate className="card grid gap-4 lg:grid-cols-[minmax(0,1fr)_9rem_11rem_auto] lg:items-start" aria-label="New build order">
          <h2 className="lg:col-span-4 font-bold">New build order</h2>
          <div>
            <label htmlFor="f-kitId" className="field-label">
              Kit revision
            </label>
            <Field
              as="select"
              id="f-kitId"
              name="kitId"
              className="field"
              aria-describedby="f-kitId-error"
              aria-invalid={touched.kitId && errors.kitId ? true : undefined}
            >
              <option value="">Choose a kit…</option>
              {kits.map((k) => (
                <option key={k.id} value={k.id}>
                  {k.label} ({k.components} parts)
                </option>
              ))}
            </Field>
            <p id="f-kitId-error" className="field-error" aria-live="polite">
              {touched.kitId ? errors.kitId : null}
            </p>
          </div>
          <FormField name="quantity" label="Number of kits" inputMode="numeric" autoComplete="off" />
          <FormField name="dueDate" label="Due date" type="date" />
          <div className="lg:pt-6">
            <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
              {isSubmitting ? 'Creating…' : 'Create draft'}
            </button>
          </div>
          <div className="lg:col-span-4">
            <FormMessage message={message} />
          </div>
        </ReadyForm>
      )}
    </Formik>
  );
}
