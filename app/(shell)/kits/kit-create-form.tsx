'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import type { KitDto } from '@/lib/contracts/kits';
import { apiFetch } from '../../_components/api-client';
import { useRequestKey } from '../../_components/request-key';
import { FormField, FormMessage } from '../../_components/form-field';
import { ComponentsEditor, componentsSchema, emptyComponent, toComponentInput, type ComponentRow } from './_components/components-editor';

const code = /^[A-Za-z0-9][A-Za-z0-9._\-/]{0,39}$/;
const schema = yup.object({
  code: yup.string().trim().matches(code, 'Letters, digits and . _ - / only, at most 40 characters').required('Kit code is required'),
  revision: yup
    .string()
    .trim()
    .matches(/^[A-Za-z0-9]{1,8}$/, 'Revision is 1–8 letters or digits, e.g. A or 03')
    .required('Revision is required'),
  description: yup.string().trim().max(200, 'At most 200 characters').required('Description is required'),
  components: componentsSchema,
});

export function KitCreateForm({ onCreated, onCancel }: { onCreated: (kit: KitDto) => void; onCancel: () => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const requestKey = useRequestKey();
  return (
    <Formik
      initialValues={{ code: '', revision: 'A', description: '', components: [emptyComponent()] as ComponentRow[] }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const body = { code: values.code, revision: values.revision, description: values.description, components: toComponentInput(values.components) };
        const res = await apiFetch<{ kit: KitDto }>('/api/v1/kits', { method: 'POST', body, headers: { 'Idempotency-Key': requestKey.keyFor(body) } });
        if (res.ok) {
          requestKey.done();
          return onCreated(res.data.kit);
        }
        helpers.setErrors(res.fields);
        setMessage(res.message);
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card space-y-4" aria-label="New kit">
          <h2 className="font-bold">New kit</h2>
          <div className="grid gap-4 md:grid-cols-[12rem_8rem_1fr]">
            <FormField name="code" label="Kit code" autoComplete="off" />
            <FormField name="revision" label="Revision" autoComplete="off" />
            <FormField name="description" label="Description" autoComplete="off" />
          </div>
          <ComponentsEditor />
          <div className="flex flex-wrap gap-3 items-center">
            <button type="submit" className="btn-primary" disabled={isSubmitting}>
              {isSubmitting ? 'Saving…' : 'Create kit'}
            </button>
            <button type="button" className="btn-quiet" onClick={onCancel}>
              Close
            </button>
            <FormMessage message={message} />
          </div>
        </ReadyForm>
      )}
    </Formik>
  );
}
