'use client';

import { Field, Formik, useFormikContext } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import * as yup from 'yup';
import { ACCURACY_CLASSES, classConformity, intervalCount, minimumCapacity } from '@/lib/metrology/accuracy-class';
import { LINE_PROFILES } from '@/lib/scale/line-format';
import type { ScaleDto } from '@/lib/contracts/scales';
import { apiFetch } from '../../../_components/api-client';
import { formatGrams } from '../../../_components/format';
import { FormField, FormMessage } from '../../../_components/form-field';
import { SelectField } from '../../../_components/select-field';
import { BAUD_RATES, CONNECTION_KINDS, profileBody, profileFieldErrors, profileValues, type ProfileValues } from './scale-profile-values';

const positive = (label: string) =>
  yup.number().typeError(`${label} must be a number`).moreThan(0, `${label} must be above 0`).required(`${label} is required`);
const optionalNumber = (label: string) =>
  yup
    .number()
    .transform((v, raw) => (raw === '' ? undefined : v))
    .typeError(`${label} must be a number`)
    .min(0, `${label} cannot be negative`);
const forKind = (kind: string, rule: yup.AnySchema) => yup.mixed().when('kind', { is: kind, then: () => rule, otherwise: (s) => s.notRequired() });

const schema = yup.object({
  name: yup.string().trim().max(80, 'At most 80 characters').required('Name is required'),
  location: yup.string().max(120, 'At most 120 characters'),
  capacity: positive('Max'),
  division: positive('d'),
  verificationInterval: optionalNumber('e').test('e-not-below-d', 'e cannot be smaller than d (OIML R 76-1)', function (e) {
    const d = Number(this.parent.division);
    return e === undefined || !(d > 0) || e >= d;
  }),
  minLoad: optionalNumber('Min'),
  repeatability: optionalNumber('s_r'),
  fullScaleVolts: forKind('raw_adc', positive('Full-scale voltage')),
  gain: forKind('raw_adc', positive('Gain')),
  bits: forKind(
    'raw_adc',
    yup.number().typeError('Bits must be a number').integer('Whole bits').min(8, '8 to 32 bits').max(32, '8 to 32 bits').required('Bits are required'),
  ),
  pollIntervalMs: forKind('serial', yup.number().typeError('A whole number of ms').integer().min(50, '50 to 5 000 ms').max(5000, '50 to 5 000 ms')),
});

// Live class check while typing: n = Max/e and Min against OIML R 76-1 Table 3.
function ClassCheck() {
  const { values } = useFormikContext<ProfileValues>();
  const max = Number(values.capacity);
  const e = Number(values.verificationInterval || values.division);
  if (!(max > 0) || !(e > 0)) return null;
  const problem = classConformity(values.accuracyClass, max, e);
  return (
    <p className={`text-sm ${problem ? 'text-fault' : 'text-ink-soft'}`} data-testid="class-check">
      n = Max/e = {intervalCount(max, e)}; default Min = {formatGrams(minimumCapacity(values.accuracyClass, e))} (OIML R 76-1 Table 3).{' '}
      {problem ? `Does not fit class ${values.accuracyClass}: ${problem}.` : `Fits class ${values.accuracyClass}.`}
    </p>
  );
}

function ConnectionFields() {
  const { values } = useFormikContext<ProfileValues>();
  if (values.kind === 'serial') {
    return (
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <SelectField name="baudRate" label="Baud rate" options={BAUD_RATES.map((b) => [String(b), String(b)])} />
        <SelectField
          name="dataBits"
          label="Data bits"
          options={[
            ['8', '8'],
            ['7', '7'],
          ]}
        />
        <SelectField
          name="parity"
          label="Parity"
          options={[
            ['none', 'none'],
            ['even', 'even'],
            ['odd', 'odd'],
          ]}
        />
        <SelectField
          name="stopBits"
          label="Stop bits"
          options={[
            ['1', '1'],
            ['2', '2'],
          ]}
        />
        <div className="sm:col-span-2">
          <SelectField
            name="lineFormat"
            label="Line format"
            options={LINE_PROFILES.map((p) => [p.name, p.name])}
            hint={LINE_PROFILES.find((p) => p.name === values.lineFormat)?.description}
          />
        </div>
        <SelectField
          name="mode"
          label="Mode"
          options={[
            ['continuous', 'Scale sends continuously'],
            ['polled', 'Tallyforge asks each time'],
          ]}
        />
        <FormField name="pollIntervalMs" label="Poll every (ms)" inputMode="numeric" />
        {values.mode === 'polled' ? <FormField name="pollRequest" label="Poll request" hint="Printable ASCII; write line ends as \r and \n." /> : null}
      </div>
    );
  }
  if (values.kind === 'raw_adc') {
    return (
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <FormField name="bits" label="Converter bits" inputMode="numeric" />
        <FormField name="fullScaleVolts" label="Full-scale input (V)" inputMode="decimal" />
        <FormField name="gain" label="Gain" inputMode="decimal" />
        <FormField name="averaging" label="Readings averaged" inputMode="numeric" />
        <label className="flex items-center gap-2 text-sm">
          <Field type="checkbox" name="reversedExcitation" className="size-5" /> Excitation wired reversed
        </label>
      </div>
    );
  }
  return null;
}

export function ScaleProfileForm({ scale }: { scale?: ScaleDto }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  return (
    <Formik
      initialValues={profileValues(scale)}
      enableReinitialize
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        setSaved(null);
        const body = profileBody(values, scale);
        const res = scale
          ? await apiFetch<{ scale: ScaleDto }>(`/api/v1/scales/${scale.id}`, { method: 'PATCH', body: { ...body, version: scale.version } })
          : await apiFetch<{ scale: ScaleDto }>('/api/v1/scales', { method: 'POST', body });
        if (!res.ok) {
          helpers.setErrors(profileFieldErrors(res.fields));
          setMessage(res.message);
          return;
        }
        if (scale) {
          setSaved('Profile saved.');
          router.refresh();
        } else router.push(`/scales/${res.data.scale.id}`);
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card space-y-4" aria-label={scale ? 'Scale profile' : 'New scale'}>
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField name="name" label="Name" autoComplete="off" />
            <FormField name="location" label="Location" autoComplete="off" />
          </div>
          <div className="grid gap-4 grid-cols-2 lg:grid-cols-4">
            <FormField name="capacity" label="Max (g)" inputMode="decimal" />
            <FormField name="division" label="Division d (g)" inputMode="decimal" />
            <FormField name="verificationInterval" label="Verification interval e (g)" inputMode="decimal" hint="Empty: e = d" />
            <SelectField name="accuracyClass" label="Accuracy class" options={ACCURACY_CLASSES.map((c) => [c, `Class ${c}`])} />
            <FormField name="minLoad" label="Min (g)" inputMode="decimal" hint="Empty: the class rule" />
            <FormField name="repeatability" label="Repeatability s_r (g)" inputMode="decimal" hint="Set by passing tests" />
          </div>
          <ClassCheck />
          <SelectField name="kind" label="Connection" options={CONNECTION_KINDS} />
          <ConnectionFields />
          <FormMessage message={message} />
          <p role="status" aria-live="polite" className="text-sm text-ok">
            {saved}
          </p>
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? 'Saving…' : scale ? 'Save profile' : 'Add scale'}
          </button>
        </ReadyForm>
      )}
    </Formik>
  );
}
