'use client';

import { Field, Formik } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useState } from 'react';
import * as yup from 'yup';
import { WEIGHT_UNITS } from '@/lib/weighing/units';
import type { SettingsDto } from '@/lib/contracts/settings';
import { apiFetch } from '../../../_components/api-client';
import { FormField, FormMessage } from '../../../_components/form-field';
import { SelectField } from '../../../_components/select-field';

const schema = yup.object({
  siteName: yup.string().trim().max(120).required('Site name is required'),
  displayUnit: yup
    .string()
    .oneOf([...WEIGHT_UNITS])
    .required(),
  defaultPieceSpread: yup.number().typeError('A number, e.g. 0.05').moreThan(0, 'Must be above 0').max(0.5, 'At most 0.5').required(),
  stabilityWindowMs: yup.number().typeError('A whole number of ms').integer().min(200, 'At least 200 ms').max(10000, 'At most 10 s').required(),
  varianceThresholdPct: yup.number().typeError('A number').min(0).max(100).required(),
  varianceThresholdPcs: yup.number().typeError('A whole number').integer().min(0).required(),
  blindCycleCounts: yup.boolean().required(),
  timeZone: yup.string(),
  fourEyesVariances: yup.boolean().required(),
  sessionHours: yup
    .number()
    .typeError('A whole number of hours')
    .integer('A whole number of hours')
    .min(1, 'At least 1 hour')
    .max(72, 'At most 72 hours')
    .required(),
});

// The form keeps "" for "follow the server"; the API takes null for it.
const formValues = (s: SettingsDto) => ({ ...s, timeZone: s.timeZoneFromServer ? '' : s.timeZone });

export function SettingsForm({ initial, zones, serverZone }: { initial: SettingsDto; zones: string[]; serverZone: string }) {
  const [current, setCurrent] = useState(initial);
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  return (
    <Formik
      initialValues={formValues(current)}
      enableReinitialize
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        setSaved(false);
        const { timeZoneFromServer: _fromServer, ...fields } = values;
        const body = {
          ...fields,
          timeZone: values.timeZone || null,
          defaultPieceSpread: Number(values.defaultPieceSpread),
          stabilityWindowMs: Number(values.stabilityWindowMs),
          varianceThresholdPct: Number(values.varianceThresholdPct),
          varianceThresholdPcs: Number(values.varianceThresholdPcs),
          sessionHours: Number(values.sessionHours),
          version: current.version,
        };
        const res = await apiFetch<{ settings: SettingsDto }>('/api/v1/settings', { method: 'PATCH', body });
        if (res.ok) {
          setCurrent(res.data.settings);
          setSaved(true);
        } else {
          helpers.setErrors(res.fields);
          setMessage(res.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <ReadyForm noValidate className="card space-y-4">
          <FormField name="siteName" label="Site name" />
          <div>
            <label htmlFor="f-displayUnit" className="field-label">
              Display unit
            </label>
            <Field as="select" id="f-displayUnit" name="displayUnit" className="field">
              {WEIGHT_UNITS.map((u) => (
                <option key={u} value={u}>
                  {u}
                </option>
              ))}
            </Field>
          </div>
          <SelectField
            name="timeZone"
            label="Time zone"
            options={[['', `The server's zone (${serverZone})`], ...zones.map((z) => [z, z] as const)]}
            hint="Days, due dates, reminders, reports and the count log's day filters follow this zone, and every time is shown in it."
          />
          <FormField
            name="sessionHours"
            label="Sessions last (hours)"
            inputMode="numeric"
            hint="However busy, a sign-in ends this long after it began (one shift is common practice); an idle one ends after 8 hours. A change applies to sign-ins from now on."
          />
          <FormField
            name="defaultPieceSpread"
            label="Assumed piece-weight spread (coefficient of variation)"
            inputMode="decimal"
            hint="Used until a part has learned its own, as a cautious upper value: counts of unlearned parts stay right for parts that vary up to this much. 0.05 (5 %) covers springs, moulded plastic and wire forms (common practice); a lower value makes unlearned counts look surer than they may be."
          />
          <FormField
            name="stabilityWindowMs"
            label="Stability window (ms)"
            inputMode="numeric"
            hint="A reading counts as steady when it stays within the scale's own noise (at least one division) for this long."
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField name="varianceThresholdPct" label="Variance needing approval (%)" inputMode="decimal" />
            <FormField name="varianceThresholdPcs" label="Variance needing approval (pieces)" inputMode="numeric" />
          </div>
          <label className="flex min-h-11 items-start gap-3">
            <Field type="checkbox" name="blindCycleCounts" className="mt-1 h-5 w-5" />
            <span>
              Count bins blind
              <span className="block text-sm text-ink-soft">
                The bench does not show a bin&apos;s book quantity before it is counted, so the book cannot steer the count (common practice for cycle counts).
              </span>
            </span>
          </label>
          <label className="flex min-h-11 items-start gap-3">
            <Field type="checkbox" name="fourEyesVariances" className="mt-1 h-5 w-5" />
            <span>
              Four eyes on variances
              <span className="block text-sm text-ink-soft">
                Whoever counted a bin cannot approve or reject its variance; someone else decides (common practice in stock control; your quality system may
                require it).
              </span>
            </span>
          </label>
          <FormMessage message={message} />
          <p role="status" aria-live="polite" className="text-sm text-ok">
            {saved ? 'Saved.' : ''}
          </p>
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? 'Saving…' : 'Save settings'}
          </button>
        </ReadyForm>
      )}
    </Formik>
  );
}
