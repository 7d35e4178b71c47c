import type { CalibrationVerdict } from '@/lib/metrology/evaluate-calibration';
import type { CalibrationRecordDto } from '@/lib/contracts/calibration';
import { formatGrams } from '../../../_components/format';

type StoredVerdict = CalibrationVerdict & { weightProblems?: string[] };

function Verdict({ pass }: { pass: boolean }) {
  return pass ? <span className="font-medium text-ok">✓ pass</span> : <span className="font-medium text-fault">✕ fail</span>;
}

function RecordCard({ record, by }: { record: CalibrationRecordDto; by: string }) {
  const v = record.verdict as StoredVerdict;
  return (
    <li className={`card border-l-4 ${record.pass ? 'border-l-ok' : 'border-l-fault'}`} data-testid={`calibration-${record.id}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-bold">
          {record.performedAt} · {record.stage === 'initial' ? 'initial verification limits' : 'in-service limits'}
        </h3>
        <span className={`rounded px-2 py-0.5 text-sm font-medium ${record.pass ? 'bg-ok-light text-ok' : 'bg-fault-light text-fault'}`}>
          {record.pass ? `Passed · next due ${record.nextDueAt}` : 'Failed · scale locked'}
        </span>
      </div>
      <p className="text-sm text-ink-faint">Recorded by {by}</p>
      <div className="mt-3 overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Weighing test points</caption>
          <thead className="text-left text-ink-soft">
            <tr>
              <th scope="col" className="py-1 pr-3 text-right">
                Load
              </th>
              <th scope="col" className="py-1 pr-3 text-right">
                Indication
              </th>
              <th scope="col" className="py-1 pr-3 text-right">
                Error
              </th>
              <th scope="col" className="py-1 pr-3 text-right">
                MPE
              </th>
              <th scope="col" className="py-1">
                Result
              </th>
            </tr>
          </thead>
          <tbody className="num">
            {v.points.map((p, i) => (
              <tr key={i} className="border-t border-paper-line">
                <td className="py-1 pr-3 text-right">{formatGrams(p.load)}</td>
                <td className="py-1 pr-3 text-right">{formatGrams(p.indication)}</td>
                <td className="py-1 pr-3 text-right">
                  {p.error > 0 ? '+' : ''}
                  {formatGrams(p.error)}
                </td>
                <td className="py-1 pr-3 text-right">± {formatGrams(p.mpe)}</td>
                <td className="py-1 font-sans">
                  <Verdict pass={p.pass} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <dl className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        <div>
          <dt className="inline text-ink-soft">Repeatability: </dt>
          <dd className="inline">
            {v.repeatability ? (
              <>
                range {formatGrams(v.repeatability.range)} of ± {formatGrams(v.repeatability.mpe)} · <Verdict pass={v.repeatability.pass} />
              </>
            ) : (
              'not tested'
            )}
          </dd>
        </div>
        <div>
          <dt className="inline text-ink-soft">Eccentricity: </dt>
          <dd className="inline">
            {v.eccentricity ? (
              <>
                largest error {formatGrams(v.eccentricity.maxError)} of ± {formatGrams(v.eccentricity.mpe)} · <Verdict pass={v.eccentricity.pass} />
              </>
            ) : (
              'not tested'
            )}
          </dd>
        </div>
      </dl>
      {record.weightProblems.length ? (
        <div className="mt-3 rounded-md bg-fault-light px-3 py-2 text-sm text-fault">
          <p className="font-medium">Test-weight problems</p>
          <ul className="list-disc pl-5">
            {record.weightProblems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {record.notes ? <p className="mt-2 text-sm text-ink-soft">Notes: {record.notes}</p> : null}
    </li>
  );
}

// Newest first. MPEs are OIML R 76-1 Table 6, doubled in service (R 76-1 3.5.2).
export function CalibrationHistory({ records, names }: { records: CalibrationRecordDto[]; names: Record<number, string> }) {
  if (!records.length) return <p className="card text-ink-soft">No test has been recorded for this scale yet.</p>;
  return (
    <ol className="space-y-3" aria-label="Calibration history">
      {records.map((r) => (
        <RecordCard key={r.id} record={r} by={names[r.performedBy] ?? 'someone no longer listed'} />
      ))}
    </ol>
  );
}
