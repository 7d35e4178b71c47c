import type { AccuracyRow } from '@/server/services/audits/accuracy-report';
import { formatPercent } from '../../../_components/format';

export function AccuracyTable({ rows, groupLabel }: { rows: AccuracyRow[]; groupLabel: string }) {
  return (
    <div className="card p-0 overflow-x-auto">
      <table className="w-full text-sm [&_td]:whitespace-nowrap [&_th]:whitespace-nowrap" aria-label="Accuracy by group">
        <thead className="bg-paper-deep text-left text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2">
              {groupLabel}
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Recounts
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Error rate
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Mean |error|
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Mean |error| %
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Nonconforming
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Exact-flagged right
            </th>
          </tr>
        </thead>
        <tbody className="num">
          {rows.map((r) => (
            <tr key={r.key} className="border-t border-paper-line">
              <th scope="row" className="px-3 py-2.5 text-left font-sans font-medium">
                {r.label}
              </th>
              <td className="px-3 py-2.5 text-right">{r.recounts}</td>
              <td className="px-3 py-2.5 text-right">{formatPercent(r.errorRate)}</td>
              <td className="px-3 py-2.5 text-right">{r.meanAbsError} pcs</td>
              <td className="px-3 py-2.5 text-right">{r.meanAbsErrorPct} %</td>
              <td className={`px-3 py-2.5 text-right ${r.nonconforming ? 'text-fault font-medium' : ''}`}>{r.nonconforming}</td>
              <td className="px-3 py-2.5 text-right">{r.exactFlagged ? `${formatPercent(r.exactRightShare)} of ${r.exactFlagged}` : '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
