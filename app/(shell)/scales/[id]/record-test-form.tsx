'use client';

import { Field, FieldArray, Formik, useFormikContext } from 'formik';
import { ReadyForm } from '../../../_components/ready-form';
import { useRouter } from 'next/navigation';
import { useState, type ReactNode } from 'react';
import type { CalibrationVerdict } from '@/lib/metrology/evaluate-calibration';
import * as yup from 'yup';
import type { CalibrationRecordDto, TestWeightDto } from '@/lib/contracts/calibration';
import type { ScaleDto } from '@/lib/contracts/scales';
import { apiFetch } from '../../../_components/api-client';
import { toFormikErrors } from '../../../_components/field-errors';
import { FormField, FormMessage } from '../../../_components/form-field';
import { SelectField } from '../../../_components/select-field';
import { LiveVerdict } from './live-verdict';
import { useSiteTime } from '../../../_components/site-time';
import { evaluateBody, initialTestValues, recordBody, resize, type TestValues } from './record-test-values';
import { TestWeightPicker } from './test-weight-picker';
import { useLiveVerdict } from './use-live-verdict';

const reading = (label: string) => yup.number().typeError(`${label} must be a number`).min(0, `${label} cannot be negative`).required(`${label} is required`);
const load = yup.number().typeError('Load must be a number').moreThan(0, 'Load must be above 0').required('Load is required');
const series = yup.object({ load, indications: yup.array(reading('Indication')).required() });

const schema = yup.object({
  performedAt: yup
    .string()
    .matches(/^\d{4}-\d{2}-\d{2}$/, 'Date must be YYYY-MM-DD')
    .required('Date is required'),
  points: yup
    .array(
      yup.object({ load, indication: reading('Indication'), testWeightIds: yup.array(yup.number()).min(1, 'Pick the test weights that made up this load') }),
    )
    .min(1, 'At least one test point'),
  repeatability: yup.object().when('withRepeatability', { is: true, then: () => series }),
  eccentricity: yup.object().when('withEccentricity', { is: true, then: () => series }),
  intervalDays: yup
    .number()
    .typeError('Days must be a whole number')
    .integer('Days must be a whole number')
    .min(7, '7 to 730 days')
    .max(730, '7 to 730 days')
    .required('Interval is required'),
  notes: yup.string().max(1000, 'At most 1 000 characters'),
});

function Series({
  name,
  title,
  counts,
  countLabel,
  positionLabel,
}: {
  name: 'repeatability' | 'eccentricity';
  title: string;
  counts: number[];
  countLabel: string;
  positionLabel: string;
}) {
  const { values, setFieldValue } = useFormikContext<TestValues>();
  const flag = name === 'repeatability' ? 'withRepeatability' : 'withEccentricity';
  const s = values[name];
  return (
    <fieldset className="rounded-md border border-paper-line p-3">
      <legend className="px-1 font-medium">
        <label className="inline-flex items-center gap-2">
          <Field type="checkbox" name={flag} className="size-5" /> {title}
        </label>
      </legend>
      {values[flag] ? (
        <div className="space-y-3">
          <div className="grid gap-3 grid-cols-2">
            <FormField name={`${name}.load`} label="Load (g)" inputMode="decimal" />
            <div>
              <label htmlFor={`f-${name}-n`} className="field-label">
                {countLabel}
              </label>
              <select
                id={`f-${name}-n`}
                className="field"
                value={s.indications.length}
                onChange={(e) => setFieldValue(`${name}.indications`, resize(s.indications, Number(e.target.value)))}
              >
                {counts.map((n) => (
                  <option key={n} value={n}>
                    {n}
                  </option>
                ))}
              </select>
            </div>
          </div>
          <div className="grid gap-3 grid-cols-2 sm:grid-cols-3 lg:grid-cols-5">
            {s.indications.map((_, i) => (
              <FormField key={i} name={`${name}.indications.${i}`} label={`${positionLabel} ${i + 1} (g)`} inputMode="decimal" />
            ))}
          </div>
        </div>
      ) : null}
    </fieldset>
  );
}

function Points({ weights, verdict }: { weights: TestWeightDto[]; verdict: CalibrationVerdict | null }) {
  const { values } = useFormikContext<TestValues>();
  return (
    <FieldArray name="points">
      {(arrayHelpers) => (
        <fieldset className="space-y-3">
          <legend className="font-medium">Weighing test (loads from Min to Max at the OIML R 76-1 Table 6 band edges)</legend>
          {values.points.map((p, i) => (
            <div key={i} className="rounded-md border border-paper-line p-3 space-y-2" data-testid={`test-point-${i}`}>
              <div className="grid gap-3 grid-cols-[1fr_1fr_auto] items-start">
                <FormField name={`points.${i}.load`} label={`Load ${i + 1} (g)`} inputMode="decimal" />
                <FormField name={`points.${i}.indication`} label={`Indication ${i + 1} (g)`} inputMode="decimal" />
                <button
                  type="button"
                  className="btn-quiet mt-6"
                  onClick={() => arrayHelpers.remove(i)}
                  aria-label={`Remove load ${i + 1}`}
                  disabled={values.points.length === 1}
                >
                  Remove
                </button>
              </div>
              <TestWeightPicker name={`points.${i}.testWeightIds`} load={Number(p.load)} weights={weights} mpe={verdict?.points[i]?.mpe ?? null} />
            </div>
          ))}
          <button type="button" className="btn-quiet" onClick={() => arrayHelpers.push({ load: '', indication: '', testWeightIds: [] })}>
            Add a load
          </button>
        </fieldset>
      )}
    </FieldArray>
  );
}

// One live verdict for the whole form, shared by the weight pickers (their 1/3-MPE hint) and the preview.
function TestForm({
  scale,
  values,
  children,
}: {
  scale: ScaleDto;
  values: TestValues;
  children: (verdict: CalibrationVerdict | null, problem: string | null) => ReactNode;
}) {
  const { verdict, problem } = useLiveVerdict(evaluateBody(values, scale));
  return <>{children(verdict, problem)}</>;
}

export function RecordTestForm({ scale, weights }: { scale: ScaleDto; weights: TestWeightDto[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<string | null>(null);
  const { today } = useSiteTime();
  const usable = weights.filter((w) => w.active);
  return (
    <Formik
      initialValues={initialTestValues(scale, today())}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setMessage(null);
        setOutcome(null);
        const res = await apiFetch<{ record: CalibrationRecordDto }>(`/api/v1/scales/${scale.id}/calibrations`, { method: 'POST', body: recordBody(values) });
        if (!res.ok) {
          helpers.setErrors(toFormikErrors(res.fields));
          setMessage(res.message);
          return;
        }
        const r = res.data.record;
        setOutcome(
          r.pass
            ? `Recorded: passed. ${scale.name} is in service until ${r.nextDueAt}.`
            : `Recorded: failed. ${scale.name} is locked out until a passing test.`,
        );
        helpers.resetForm();
        router.refresh();
      }}
    >
      {({ isSubmitting, values }) => (
        <TestForm scale={scale} values={values}>
          {(verdict, problem) => (
            <ReadyForm noValidate className="card space-y-4" aria-label="Record a test">
              <div className="grid gap-4 lg:grid-cols-3">
                <SelectField
                  name="stage"
                  label="Limits"
                  options={[
                    ['in_service', 'In service (2 × MPE)'],
                    ['initial', 'Initial verification'],
                  ]}
                />
                <FormField name="performedAt" type="date" label="Tested on" />
                <FormField
                  name="intervalDays"
                  label="Next test in (days)"
                  inputMode="numeric"
                  hint="6–12 months is common practice; your quality system decides."
                />
              </div>
              {usable.length ? null : (
                <p className="rounded-md bg-caution-light px-3 py-2 text-sm text-caution">No test weights are on file. Add them under Test weights first.</p>
              )}
              <Points weights={usable} verdict={verdict} />
              <Series
                name="repeatability"
                title="Repeatability: the same load several times"
                counts={[2, 3, 4, 5, 6, 8, 10]}
                countLabel="Weighings"
                positionLabel="Weighing"
              />
              <Series name="eccentricity" title="Eccentricity: the load off centre" counts={[4, 5]} countLabel="Positions" positionLabel="Position" />
              <div className="flex flex-wrap gap-6">
                <label className="inline-flex items-center gap-2">
                  <Field type="checkbox" name="zeroOk" className="size-5" /> Zero setting works
                </label>
                <label className="inline-flex items-center gap-2">
                  <Field type="checkbox" name="tareOk" className="size-5" /> Tare works
                </label>
              </div>
              <div>
                <label htmlFor="f-notes" className="field-label">
                  Notes
                </label>
                <Field as="textarea" id="f-notes" name="notes" rows={2} className="field py-2" />
              </div>
              <LiveVerdict verdict={verdict} problem={problem} zeroOk={values.zeroOk} tareOk={values.tareOk} />
              <FormMessage message={message} />
              <p role="status" aria-live="polite" className="text-sm font-medium" data-testid="test-outcome">
                {outcome}
              </p>
              <button type="submit" className="btn-primary" disabled={isSubmitting || !usable.length}>
                {isSubmitting ? 'Saving…' : 'Save test record'}
              </button>
            </ReadyForm>
          )}
        </TestForm>
      )}
    </Formik>
  );
}
