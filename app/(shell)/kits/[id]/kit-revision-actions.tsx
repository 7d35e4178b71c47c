'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import type { KitDto } from '@/lib/contracts/kits';
import { apiFetch } from '../../../_components/api-client';
import { FormField, FormMessage } from '../../../_components/form-field';

const copySchema = yup.object({
  revision: yup
    .string()
    .trim()
    .matches(/^[A-Za-z0-9]{1,8}$/, 'Revision is 1–8 letters or digits, e.g. B or 04')
    .required('New revision is required'),
});

// New revisions carry the parts over; retiring keeps the revision for history but offers it to no new order.
export function KitRevisionActions({ kit, onChanged }: { kit: KitDto; onChanged: (k: KitDto) => void }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);

  async function setActive(active: boolean) {
    setMessage(null);
    const res = await apiFetch<{ kit: KitDto }>(`/api/v1/kits/${kit.id}`, { method: 'PATCH', body: { active, version: kit.version } });
    if (res.ok) {
      onChanged(res.data.kit);
      router.refresh();
    } else setMessage(res.message);
  }

  return (
    <section className="card space-y-4" aria-labelledby="revision-title">
      <h2 id="revision-title" className="font-bold">
        Revisions
      </h2>
      <Formik
        initialValues={{ revision: '' }}
        validationSchema={copySchema}
        onSubmit={async (values, helpers) => {
          setMessage(null);
          const res = await apiFetch<{ kit: KitDto }>(`/api/v1/kits/${kit.id}/revisions`, { method: 'POST', body: values });
          if (res.ok) return router.push(`/kits/${res.data.kit.id}`);
          helpers.setErrors(res.fields);
          setMessage(res.message);
        }}
      >
        {({ isSubmitting }) => (
          <ReadyForm noValidate className="flex flex-wrap items-start gap-3" aria-label="Copy to a new revision">
            <div className="w-40">
              <FormField name="revision" label="New revision" autoComplete="off" />
            </div>
            <button type="submit" className="btn-quiet md:mt-6" disabled={isSubmitting}>
              Copy to new revision
            </button>
          </ReadyForm>
        )}
      </Formik>
      <div className="flex flex-wrap items-center gap-3">
        {kit.active ? (
          <button type="button" className="btn-danger" onClick={() => setActive(false)}>
            Retire revision {kit.revision}
          </button>
        ) : (
          <button type="button" className="btn-quiet" onClick={() => setActive(true)}>
            Bring revision {kit.revision} back into use
          </button>
        )}
        <span className="text-sm text-ink-faint">
          {kit.active ? 'Retired revisions stay on their orders but cannot start new ones.' : 'This revision cannot start new orders.'}
        </span>
      </div>
      <FormMessage message={message} />
    </section>
  );
}
