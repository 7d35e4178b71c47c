'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import { BIN_CODE_HINT, parseBinCode } from '@/lib/bin-code';
import { CYCLE_DAYS } from '@/lib/variance';
import { apiFetch } from '../../_components/api-client';
import { useRequestKey } from '../../_components/request-key';
import { toFormikErrors } from '../../_components/field-errors';
import { FormField, FormMessage } from '../../_components/form-field';
import { SelectField } from '../../_components/select-field';

const schema = yup.object({
  code: yup
    .string()
    .required('Bin code is required')
    .test('bin-code', `Bin codes look like ${BIN_CODE_HINT}`, (v) => !v || parseBinCode(v) !== null),
  partId: yup.string().required('Pick the part this bin holds'),
  bookQuantity: yup
    .number()
    .typeError('A whole number of pieces')
    .integer('A whole number of pieces')
    .min(0, 'Cannot be negative')
    .required('Opening quantity is required'),
});

export function BinForm({ parts, containers }: { parts: Array<{ id: number; partNumber: string }>; containers: Array<{ id: number; name: string }> }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const requestKey = useRequestKey();
  return (
    <Formik
      initialValues={{ code: '', partId: '', containerId: '', bookQuantity: '0', abcClass: 'C' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        setSaved(null);
        const body = {
          code: values.code,
          partId: Number(values.partId),
          containerId: values.containerId ? Number(values.containerId) : null,
          bookQuantity: Number(values.bookQuantity),
          abcClass: values.abcClass,
        };
        const res = await apiFetch<{ bin: { code: string } }>('/api/v1/bins', {
          method: 'POST',
          body,
          headers: { 'Idempotency-Key': requestKey.keyFor(body) },
        });
        if (!res.ok) {
          helpers.setErrors(toFormikErrors(res.fields));
          setMessage(res.message);
          return;
        }
        requestKey.done();
        setSaved(`Bin ${res.data.bin.code} added.`);
        helpers.resetForm();
        router.refresh();
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card grid gap-4 sm:grid-cols-2 lg:grid-cols-5 lg:items-start" aria-label="Add a bin">
          <FormField name="code" label="Bin code" autoComplete="off" hint={BIN_CODE_HINT} />
          <SelectField name="partId" label="Part" options={[['', 'Choose a part'], ...parts.map((p) => [String(p.id), p.partNumber] as const)]} />
          <SelectField name="containerId" label="Container" options={[['', 'None'], ...containers.map((c) => [String(c.id), c.name] as const)]} />
          <FormField name="bookQuantity" label="Opening quantity (pcs)" inputMode="numeric" />
          <SelectField
            name="abcClass"
            label="ABC class"
            options={(Object.keys(CYCLE_DAYS) as Array<keyof typeof CYCLE_DAYS>).map((c) => [c, `${c} · every ${CYCLE_DAYS[c]} days`])}
          />
          <div className="sm:col-span-2 lg:col-span-5 flex flex-wrap items-center gap-4">
            <button type="submit" className="btn-primary" disabled={isSubmitting}>
              {isSubmitting ? 'Adding…' : 'Add bin'}
            </button>
            <p role="status" aria-live="polite" className="text-sm text-ok">
              {saved}
            </p>
          </div>
          <div className="sm:col-span-2 lg:col-span-5">
            <FormMessage message={message} />
          </div>
        </ReadyForm>
      )}
    </Formik>
  );
}
