'use client';

import { useState } from 'react';
import type { TestWeightDto } from '@/lib/contracts/calibration';
import { formatGrams } from '../../../_components/format';
import { TestWeightForm } from './test-weight-form';

export function TestWeightBoard({ initial }: { initial: TestWeightDto[] }) {
  const [weights, setWeights] = useState(initial);
  const [notice, setNotice] = useState<string | null>(null);
  return (
    <div className="space-y-4">
      <TestWeightForm
        onCreated={(w) => {
          setWeights((list) => [...list, w].sort((a, b) => a.nominal - b.nominal || a.identifier.localeCompare(b.identifier)));
          setNotice(`${w.identifier} added.`);
        }}
      />
      <p role="status" aria-live="polite" className={notice ? 'text-sm text-ok' : 'sr-only'}>
        {notice}
      </p>
      <div className="card p-0 overflow-x-auto">
        <table className="w-full text-sm" aria-label="Test weights">
          <thead className="bg-paper-deep text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">
                Identifier
              </th>
              <th scope="col" className="px-3 py-2">
                Class
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Nominal
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                MPE
              </th>
              <th scope="col" className="px-3 py-2">
                Certificate
              </th>
              <th scope="col" className="px-3 py-2">
                Due
              </th>
            </tr>
          </thead>
          <tbody>
            {weights.map((w) => (
              <tr key={w.id} className="border-t border-paper-line">
                <td className="px-3 py-2.5 num font-medium">
                  {w.identifier}
                  {w.active ? '' : ' (retired)'}
                </td>
                <td className="px-3 py-2.5">{w.weightClass}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{formatGrams(w.nominal)}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{w.mpeMg === null ? '—' : `± ${w.mpeMg} mg`}</td>
                <td className="px-3 py-2.5">{w.certificateNumber ?? <span className="text-ink-faint">none on file</span>}</td>
                <td className="px-3 py-2.5 num whitespace-nowrap">
                  {w.dueAt ?? <span className="font-sans text-ink-faint">no date</span>}
                  {w.overdue ? <span className="ml-2 rounded bg-fault-light px-1.5 py-0.5 font-sans text-xs font-medium text-fault">✕ overdue</span> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {weights.length === 0 ? <p className="p-4 text-ink-soft">No test weights yet.</p> : null}
      </div>
      <p className="text-xs text-ink-faint">
        MPE: maximum permissible error of the weight's class, OIML R 111-1 Table 1. A test uses weights whose combined MPE is at most 1/3 of the scale&apos;s
        MPE at that load (OIML R 76-1 3.7.1). Overdue weights are flagged in the test record.
      </p>
    </div>
  );
}
