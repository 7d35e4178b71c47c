'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import { NOMINAL_VALUES_G, WEIGHT_CLASSES } from '@/lib/metrology/weight-classes';
import type { TestWeightDto } from '@/lib/contracts/calibration';
import { apiFetch } from '../../../_components/api-client';
import { toFormikErrors } from '../../../_components/field-errors';
import { formatGrams } from '../../../_components/format';
import { FormField, FormMessage } from '../../../_components/form-field';
import { SelectField } from '../../../_components/select-field';

const schema = yup.object({
  identifier: yup
    .string()
    .trim()
    .matches(/^[A-Za-z0-9][A-Za-z0-9._\-/]{0,39}$/, 'Letters, digits and . _ - / only')
    .required('Identifier is required'),
  certificateNumber: yup.string().max(60, 'At most 60 characters'),
  dueAt: yup.string().matches(/^(\d{4}-\d{2}-\d{2})?$/, 'Date must be YYYY-MM-DD'),
});

const initial = { identifier: '', nominal: '1000', weightClass: 'F1', certificateNumber: '', dueAt: '' };

export function TestWeightForm({ onCreated }: { onCreated: (w: TestWeightDto) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  return (
    <Formik
      initialValues={initial}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        const body = {
          ...values,
          nominal: Number(values.nominal),
          unit: 'g',
          certificateNumber: values.certificateNumber.trim() || null,
          dueAt: values.dueAt || null,
        };
        const res = await apiFetch<{ testWeight: TestWeightDto }>('/api/v1/test-weights', { method: 'POST', body });
        if (!res.ok) {
          helpers.setErrors(toFormikErrors(res.fields));
          setMessage(res.message);
          return;
        }
        onCreated(res.data.testWeight);
        helpers.resetForm();
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm
          noValidate
          className="card grid gap-4 sm:grid-cols-2 lg:grid-cols-[1fr_9rem_7rem_1fr_10rem_auto] lg:items-start"
          aria-label="Add a test weight"
        >
          <FormField name="identifier" label="Identifier" autoComplete="off" placeholder="e.g. TW-1K-03" />
          <SelectField name="nominal" label="Nominal" options={NOMINAL_VALUES_G.map((g) => [String(g), formatGrams(g)])} />
          <SelectField name="weightClass" label="Class" options={WEIGHT_CLASSES.map((c) => [c, c])} />
          <FormField name="certificateNumber" label="Certificate number" autoComplete="off" />
          <FormField name="dueAt" type="date" label="Due for recalibration" />
          <div className="lg:pt-6">
            <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
              {isSubmitting ? 'Adding…' : 'Add weight'}
            </button>
          </div>
          <div className="sm:col-span-2 lg:col-span-6">
            <FormMessage message={message} />
          </div>
        </ReadyForm>
      )}
    </Formik>
  );
}
