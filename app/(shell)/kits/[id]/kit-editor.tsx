'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import type { KitDto } from '@/lib/contracts/kits';
import { apiFetch } from '../../../_components/api-client';
import { FormField, FormMessage } from '../../../_components/form-field';
import { ComponentsEditor, componentsSchema, toComponentInput, type ComponentRow } from '../_components/components-editor';
import { KitRevisionActions } from './kit-revision-actions';

const schema = yup.object({
  description: yup.string().trim().max(200, 'At most 200 characters').required('Description is required'),
  components: componentsSchema,
});

const toRows = (kit: KitDto): ComponentRow[] =>
  kit.components.map((c) => ({
    partNumber: c.partNumber,
    partId: c.partId,
    description: c.description,
    quantity: String(c.quantity),
    toleranceBelow: String(c.toleranceBelow),
    toleranceAbove: String(c.toleranceAbove),
  }));

export function KitEditor({ kit, canEdit }: { kit: KitDto; canEdit: boolean }) {
  const router = useRouter();
  const [current, setCurrent] = useState(kit);
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  if (!canEdit) return <KitReadOnly kit={current} />;
  return (
    <div className="space-y-6">
      <Formik
        initialValues={{ description: current.description, components: toRows(current) }}
        enableReinitialize
        validationSchema={schema}
        onSubmit={async (values, helpers) => {
          setMessage(null);
          setSaved(false);
          const res = await apiFetch<{ kit: KitDto }>(`/api/v1/kits/${current.id}`, {
            method: 'PATCH',
            body: { description: values.description, components: toComponentInput(values.components), version: current.version },
          });
          if (res.ok) {
            setCurrent(res.data.kit);
            setSaved(true);
            router.refresh();
            return;
          }
          helpers.setErrors(res.fields);
          setMessage(res.message);
        }}
      >
        {({ isSubmitting }) => (
          <ReadyForm noValidate className="card space-y-4" aria-label="Bill of material">
            <FormField name="description" label="Description" autoComplete="off" />
            <ComponentsEditor />
            <div className="flex flex-wrap gap-3 items-center">
              <button type="submit" className="btn-primary" disabled={isSubmitting}>
                {isSubmitting ? 'Saving…' : 'Save kit'}
              </button>
              <p role="status" aria-live="polite" className="text-sm text-ok">
                {saved ? 'Saved.' : ''}
              </p>
              <FormMessage message={message} />
            </div>
          </ReadyForm>
        )}
      </Formik>
      <KitRevisionActions kit={current} onChanged={setCurrent} />
    </div>
  );
}

function KitReadOnly({ kit }: { kit: KitDto }) {
  return (
    <section className="card space-y-3">
      <p>{kit.description}</p>
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left border-b border-paper-line text-ink-soft">
            <th scope="col" className="py-2 pr-3">
              Part number
            </th>
            <th scope="col" className="py-2 pr-3">
              Description
            </th>
            <th scope="col" className="py-2 pr-3 text-right">
              Qty per kit
            </th>
            <th scope="col" className="py-2 text-right">
              Tolerance
            </th>
          </tr>
        </thead>
        <tbody>
          {kit.components.map((c) => (
            <tr key={c.partId} className="border-b border-paper-line">
              <td className="py-2 pr-3 num">{c.partNumber}</td>
              <td className="py-2 pr-3">{c.description}</td>
              <td className="py-2 pr-3 text-right num">{c.quantity}</td>
              <td className="py-2 text-right num">
                −{c.toleranceBelow} / +{c.toleranceAbove}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
