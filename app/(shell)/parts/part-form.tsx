'use client';

import { Field, Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import type { PartDto } from '@/lib/contracts/parts';
import { apiFetch } from '../../_components/api-client';
import { FormField, FormMessage } from '../../_components/form-field';
import { PartPhoto } from './part-photo';

const schema = yup.object({
  partNumber: yup
    .string()
    .trim()
    .matches(/^[A-Za-z0-9][A-Za-z0-9._\-/]{0,39}$/, 'Letters, digits and . _ - / only, at most 40 characters')
    .required('Part number is required'),
  description: yup.string().trim().max(200, 'At most 200 characters').required('Description is required'),
  countingMethod: yup.string().oneOf(['scale', 'hand']).required(),
});

// Creates a part, or edits the one given (its part number stays: labels and scans carry it).
// A new photo bumps the part's version, so the form takes the part back through onPhotoSaved.
export function PartForm({
  part,
  onSaved,
  onPhotoSaved,
  onCancel,
}: {
  part: PartDto | null;
  onSaved: (p: PartDto) => void;
  onPhotoSaved: (p: PartDto) => void;
  onCancel: () => void;
}) {
  const [message, setMessage] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ partNumber: part?.partNumber ?? '', description: part?.description ?? '', countingMethod: part?.countingMethod ?? 'scale' }}
      enableReinitialize
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const res = part
          ? await apiFetch<{ part: PartDto }>(`/api/v1/parts/${part.id}`, {
              method: 'PATCH',
              body: { description: values.description, countingMethod: values.countingMethod, version: part.version },
            })
          : await apiFetch<{ part: PartDto }>('/api/v1/parts', { method: 'POST', body: values });
        if (res.ok) {
          onSaved(res.data.part);
          if (!part) helpers.resetForm();
          return;
        }
        helpers.setErrors(res.fields);
        setMessage(res.message);
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm
          noValidate
          className="card grid gap-4 md:grid-cols-[12rem_1fr_10rem] md:items-start"
          aria-label={part ? `Edit ${part.partNumber}` : 'New part'}
        >
          <h2 className="md:col-span-3 font-bold">{part ? `Edit ${part.partNumber}` : 'New part'}</h2>
          <FormField name="partNumber" label="Part number" autoComplete="off" disabled={Boolean(part)} />
          <FormField name="description" label="Description" autoComplete="off" />
          <div>
            <label htmlFor="f-countingMethod" className="field-label">
              Counted by
            </label>
            <Field as="select" id="f-countingMethod" name="countingMethod" className="field">
              <option value="scale">Scale</option>
              <option value="hand">Hand</option>
            </Field>
          </div>
          {part ? <PartPhoto part={part} onSaved={onPhotoSaved} /> : null}
          <div className="md:col-span-3 flex flex-wrap gap-3 items-center">
            <button type="submit" className="btn-primary" disabled={isSubmitting}>
              {isSubmitting ? 'Saving…' : part ? 'Save part' : 'Add part'}
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
