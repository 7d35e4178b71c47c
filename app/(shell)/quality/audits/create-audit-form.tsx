'use client';

import { Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import { AQLS } from '@/lib/sampling/iso2859';
import type { AuditDto } from '@/lib/contracts/audits';
import { apiFetch } from '../../../_components/api-client';
import { toFormikErrors } from '../../../_components/field-errors';
import { FormField, FormMessage } from '../../../_components/form-field';
import { SelectField } from '../../../_components/select-field';
import { LEVELS } from './sampling-plan-calculator';

type Option = { id: number; label: string };

const PURPOSES: ReadonlyArray<readonly [string, string]> = [
  ['', 'Any'],
  ['kit_line', 'Kit lines'],
  ['bin', 'Bin counts'],
  ['part', 'Part counts'],
  ['audit', 'Audit counts'],
];
const date = yup
  .string()
  .matches(/^\d{4}-\d{2}-\d{2}$/, 'Date must be YYYY-MM-DD')
  .required('Date is required');
const schema = yup.object({
  from: date,
  to: date.test('after-from', 'To must not be before From', function (to) {
    return !to || !this.parent.from || to >= this.parent.from;
  }),
  seed: yup
    .number()
    .transform((v, raw) => (raw === '' ? undefined : v))
    .typeError('A whole number')
    .integer('A whole number')
    .min(1, '1 to 2 147 483 646')
    .max(2 ** 31 - 2, '1 to 2 147 483 646'),
});

const choices = (list: Option[], any: string) => [['', any] as const, ...list.map((o) => [String(o.id), o.label] as const)];

export function CreateAuditForm({
  parts,
  operators,
  scales,
  today,
  monthAgo,
}: {
  parts: Option[];
  operators: Option[];
  scales: Option[];
  today: string;
  monthAgo: string;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ from: monthAgo, to: today, partId: '', operatorId: '', scaleId: '', purpose: '', level: 'II', aql: '1', seed: '' }}
      validationSchema={schema}
      onSubmit={async (v, helpers) => {
        setMessage(null);
        const id = (x: string) => (x ? Number(x) : undefined);
        const population = {
          from: v.from,
          to: v.to,
          partId: id(v.partId),
          operatorId: id(v.operatorId),
          scaleId: id(v.scaleId),
          purpose: v.purpose || undefined,
        };
        const res = await apiFetch<{ audit: AuditDto }>('/api/v1/audits', {
          method: 'POST',
          body: { population, level: v.level, aql: Number(v.aql), seed: id(v.seed) },
        });
        if (!res.ok) {
          // Population fields come back as population.from etc.; show them on the inputs of the same name.
          helpers.setErrors(toFormikErrors(Object.fromEntries(Object.entries(res.fields).map(([k, m]) => [k.replace(/^population\./, ''), m]))));
          setMessage(res.message);
          return;
        }
        router.push(`/quality/audits/${res.data.audit.id}`);
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card space-y-4" aria-label="Start an audit">
          <h2 className="font-bold">Start an audit</h2>
          <p className="text-sm text-ink-soft">
            The lot is every count captured in the period that matches the filters; the sample is drawn at random with a recorded seed.
          </p>
          <div className="grid gap-4 grid-cols-2 lg:grid-cols-4">
            <FormField name="from" type="date" label="Counted from" />
            <FormField name="to" type="date" label="Counted to" />
            <SelectField name="purpose" label="Kind of count" options={PURPOSES} />
            <SelectField name="partId" label="Part" options={choices(parts, 'Any part')} />
            <SelectField name="operatorId" label="Counted by" options={choices(operators, 'Anyone')} />
            <SelectField name="scaleId" label="Scale" options={choices(scales, 'Any scale')} />
            <SelectField name="level" label="Inspection level" options={LEVELS.map((l) => [l, l])} />
            <SelectField name="aql" label="AQL (%)" options={AQLS.map((a) => [String(a), String(a)])} />
            <FormField name="seed" label="Seed (optional)" inputMode="numeric" hint="To repeat an earlier selection" />
          </div>
          <FormMessage message={message} />
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? 'Drawing the sample…' : 'Draw the sample'}
          </button>
        </ReadyForm>
      )}
    </Formik>
  );
}
