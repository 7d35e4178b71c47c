'use client';

import { FieldArray, getIn, useFormikContext } from 'formik';
import * as yup from 'yup';
import { PartNumberInput } from './part-number-input';

export interface ComponentRow {
  partNumber: string;
  partId: number | null;
  description: string;
  quantity: string;
  toleranceBelow: string;
  toleranceAbove: string;
}

const pieces = (label: string, min: number) =>
  yup
    .number()
    .typeError(`${label}: a whole number`)
    .integer(`${label}: a whole number`)
    .min(min, `${label}: at least ${min}`)
    .max(100_000, `${label}: too large`);

export const componentsSchema = yup
  .array(
    yup.object({
      partId: yup.number().nullable().required('Type a part number that exists'),
      quantity: pieces('Quantity', 1).required('Quantity is required'),
      toleranceBelow: pieces('Below', 0).required('Below is required'),
      toleranceAbove: pieces('Above', 0).required('Above is required'),
    }),
  )
  .min(1, 'A kit needs at least one part')
  .test('unique', 'Each part may appear once per kit', (list) => new Set(list?.map((c) => c.partId)).size === (list?.length ?? 0));

export const emptyComponent = (): ComponentRow => ({ partNumber: '', partId: null, description: '', quantity: '1', toleranceBelow: '0', toleranceAbove: '0' });

export const toComponentInput = (rows: ComponentRow[]) =>
  rows.map((c) => ({ partId: c.partId, quantity: Number(c.quantity), toleranceBelow: Number(c.toleranceBelow), toleranceAbove: Number(c.toleranceAbove) }));

// The bill of material as editable lines: part by part number, quantity per kit, tolerance −a / +b pieces.
export function ComponentsEditor() {
  const { values, errors, touched, setFieldValue, getFieldProps, submitCount } = useFormikContext<{ components: ComponentRow[] }>();
  const listError = typeof errors.components === 'string' ? errors.components : null;
  return (
    <FieldArray name="components">
      {({ push, remove }) => (
        <fieldset className="space-y-2">
          <legend className="font-bold mb-2">Parts per kit</legend>
          <div className="hidden lg:grid lg:grid-cols-[12rem_1fr_7rem_6rem_6rem_5rem] gap-2 text-sm text-ink-soft">
            <span>Part number</span>
            <span>Description</span>
            <span>Qty per kit</span>
            <span>Below (−)</span>
            <span>Above (+)</span>
            <span />
          </div>
          {values.components.map((c, i) => {
            const error = (key: string) => (getIn(touched, `components.${i}.${key}`) || submitCount > 0 ? getIn(errors, `components.${i}.${key}`) : undefined);
            const messages = ['partId', 'quantity', 'toleranceBelow', 'toleranceAbove'].map(error).filter(Boolean);
            return (
              <div
                key={i}
                className="grid grid-cols-3 lg:grid-cols-[12rem_1fr_7rem_6rem_6rem_5rem] gap-2 items-start border-b border-paper-line pb-2 lg:border-0 lg:pb-0"
                data-testid={`component-${i}`}
              >
                <div className="col-span-3 lg:col-span-1">
                  <label htmlFor={`c-${i}-part`} className="field-label lg:sr-only">
                    Part number (line {i + 1})
                  </label>
                  <PartNumberInput
                    id={`c-${i}-part`}
                    value={c.partNumber}
                    invalid={Boolean(error('partId'))}
                    describedBy={`c-${i}-error`}
                    onChange={(partNumber, part) => {
                      setFieldValue(`components.${i}`, { ...values.components[i], partNumber, partId: part?.id ?? null, description: part?.description ?? '' });
                    }}
                  />
                </div>
                <p className="col-span-3 lg:col-span-1 text-sm text-ink-soft lg:pt-3 truncate">{c.description || <span className="text-ink-faint">—</span>}</p>
                {(['quantity', 'toleranceBelow', 'toleranceAbove'] as const).map((key) => (
                  <div key={key}>
                    <label htmlFor={`c-${i}-${key}`} className="field-label lg:sr-only">
                      {key === 'quantity' ? 'Qty per kit' : key === 'toleranceBelow' ? 'Below (−)' : 'Above (+)'} (line {i + 1})
                    </label>
                    <input
                      id={`c-${i}-${key}`}
                      className="field num"
                      inputMode="numeric"
                      {...getFieldProps(`components.${i}.${key}`)}
                      aria-invalid={error(key) ? true : undefined}
                      aria-describedby={`c-${i}-error`}
                    />
                  </div>
                ))}
                <button
                  type="button"
                  className="btn-quiet px-2 col-span-3 justify-self-start lg:col-span-1 lg:justify-self-stretch"
                  onClick={() => remove(i)}
                  aria-label={`Remove line ${i + 1}`}
                >
                  Remove
                </button>
                <p id={`c-${i}-error`} className="col-span-3 lg:col-span-6 field-error mt-0" aria-live="polite">
                  {messages.join(' · ')}
                </p>
              </div>
            );
          })}
          <p className="field-error" aria-live="polite">
            {listError}
          </p>
          <button type="button" className="btn-quiet" onClick={() => push(emptyComponent())}>
            Add a part
          </button>
        </fieldset>
      )}
    </FieldArray>
  );
}
