'use client';

import { useRef, useState, type KeyboardEvent } from 'react';
import * as yup from 'yup';
import type { AuditDto, AuditItemDto } from '@/lib/contracts/audits';
import { apiFetch } from '../../../../_components/api-client';
import { useSiteTime } from '../../../../_components/site-time';
import { AuditVerdict } from '../audit-verdict';
import { ItemVerdict } from './item-verdict';

const handCount = yup
  .number()
  .typeError('A whole number of pieces')
  .integer('A whole number of pieces')
  .min(0, 'Cannot be negative')
  .required('Enter the hand count');

// One input per selected count. Enter saves the recount and moves to the next item, so a whole
// audit can be keyed in without the mouse.
export function AuditRecount({
  initial,
  scaleNames,
  operatorNames,
}: {
  initial: AuditDto;
  scaleNames: Record<number, string>;
  operatorNames: Record<number, string>;
}) {
  const { when } = useSiteTime();
  const [audit, setAudit] = useState(initial);
  const [drafts, setDrafts] = useState<Record<number, string>>(() =>
    Object.fromEntries(initial.items.map((i) => [i.id, i.handCount === null ? '' : String(i.handCount)])),
  );
  const [errors, setErrors] = useState<Record<number, string>>({});
  const [saving, setSaving] = useState<number | null>(null);
  const inputs = useRef<Array<HTMLInputElement | null>>([]);
  const closed = audit.status === 'closed';
  const counted = audit.items.filter((i) => i.handCount !== null);
  const nonconforming = counted.filter((i) => i.withinUncertainty === false).length;

  async function save(item: AuditItemDto, index: number) {
    const text = drafts[item.id] ?? '';
    let value: number;
    try {
      value = handCount.validateSync(text.trim() === '' ? undefined : text);
    } catch (e) {
      setErrors((x) => ({ ...x, [item.id]: (e as yup.ValidationError).message }));
      return;
    }
    const next = () =>
      inputs.current
        .slice(index + 1)
        .find((el) => el && !el.disabled)
        ?.focus();
    if (item.handCount === value) return next();
    setSaving(item.id);
    const res = await apiFetch<{ audit: AuditDto }>(`/api/v1/audits/${audit.id}/items/${item.id}`, { method: 'PUT', body: { handCount: value } });
    setSaving(null);
    if (!res.ok) {
      setErrors((x) => ({ ...x, [item.id]: res.fields.handCount ?? res.message }));
      return;
    }
    setErrors((x) => ({ ...x, [item.id]: '' }));
    setAudit(res.data.audit);
    next();
  }

  const onKey = (item: AuditItemDto, index: number) => (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key !== 'Enter') return;
    e.preventDefault();
    void save(item, index);
  };

  return (
    <div className="space-y-4">
      <section
        aria-label="Lot verdict"
        className={`card ${closed ? (audit.verdict === 'accepted' ? 'border-ok' : 'border-fault') : ''}`}
        data-testid="lot-verdict"
      >
        <div className="flex flex-wrap items-center justify-between gap-2">
          <p className="font-bold">
            {closed
              ? `${audit.defects} of ${audit.sampleSize} recounts outside their stated uncertainty`
              : `${counted.length} of ${audit.sampleSize} recounted · ${nonconforming} nonconforming so far`}
          </p>
          <AuditVerdict status={audit.status} verdict={audit.verdict} />
        </div>
        <p className="text-sm text-ink-soft">
          {closed
            ? audit.verdict === 'accepted'
              ? `At most ${audit.accept} allowed (Ac): the lot of ${audit.lotSize} counts is accepted.`
              : `${audit.reject} or more rejects the lot (Re): review the parts, scales and people involved. Quality and planners were e-mailed.`
            : 'Type what you count by hand and press Enter to save and move to the next item. The lot is judged when the last recount is in.'}
        </p>
      </section>
      <div className="card p-0 overflow-x-auto">
        <table className="w-full text-sm" aria-label="Counts to recount">
          <thead className="bg-paper-deep text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">
                #
              </th>
              <th scope="col" className="px-3 py-2">
                Count
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Scale count
              </th>
              <th scope="col" className="px-3 py-2">
                Hand count
              </th>
              <th scope="col" className="px-3 py-2 hidden lg:table-cell">
                Result
              </th>
            </tr>
          </thead>
          <tbody>
            {audit.items.map((item, index) => (
              <tr key={item.id} className="border-t border-paper-line align-top" data-testid={`audit-item-${index}`}>
                <td className="px-3 py-2.5 num text-ink-faint">{index + 1}</td>
                <td className="px-3 py-2.5">
                  <span className="block font-medium">{item.partNumber}</span>
                  <span className="block whitespace-nowrap">{when(item.countedAt)}</span>
                  <span className="block text-ink-faint">
                    {scaleNames[item.scaleId] ?? `scale ${item.scaleId}`} · {operatorNames[item.operatorId] ?? 'unknown'}
                  </span>
                </td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">
                  {item.exact ? `${item.count} pcs, exact` : `${item.count} ± ${item.wholePieceRange} pcs`}
                  <span className="block font-sans text-ink-faint">{item.exact ? 'flagged exact' : 'not exact'}</span>
                </td>
                <td className="px-3 py-2.5">
                  <input
                    ref={(el) => {
                      inputs.current[index] = el;
                    }}
                    aria-label={`Hand count for item ${index + 1}, ${item.partNumber}`}
                    aria-invalid={errors[item.id] ? true : undefined}
                    aria-describedby={`hand-${item.id}-error`}
                    className="field num w-28"
                    inputMode="numeric"
                    enterKeyHint="next"
                    disabled={closed || saving === item.id}
                    value={drafts[item.id] ?? ''}
                    onChange={(e) => setDrafts((d) => ({ ...d, [item.id]: e.target.value }))}
                    onKeyDown={onKey(item, index)}
                  />
                  <p id={`hand-${item.id}-error`} className="field-error" aria-live="polite">
                    {errors[item.id] || null}
                  </p>
                  {/* On narrow screens the result sits under the input instead of in a column off to the side. */}
                  <span className="lg:hidden">
                    <ItemVerdict item={item} />
                  </span>
                </td>
                <td className="px-3 py-2.5 hidden lg:table-cell">
                  <ItemVerdict item={item} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
