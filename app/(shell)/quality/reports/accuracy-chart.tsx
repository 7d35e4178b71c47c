import type { AccuracyRow } from '@/server/services/audits/accuracy-report';
import { formatPercent } from '../../../_components/format';

const BAR = 22;
const GAP = 10;
const LABEL = 150;
const WIDTH = 640;

// Error rate per group as plain SVG bars (scaled to the worst group, at least 10 %), with the
// nonconforming part drawn darker inside each bar.
export function AccuracyChart({ rows }: { rows: AccuracyRow[] }) {
  const top = Math.max(0.1, ...rows.map((r) => r.errorRate));
  const plot = WIDTH - LABEL - 70;
  const height = rows.length * (BAR + GAP) + GAP;
  return (
    <figure className="card">
      <figcaption className="mb-2 font-bold">Error rate by group</figcaption>
      <svg viewBox={`0 0 ${WIDTH} ${height}`} className="w-full max-w-3xl" role="img" aria-label="Bar chart of error rate by group">
        {rows.map((r, i) => {
          const y = GAP + i * (BAR + GAP);
          const w = (r.errorRate / top) * plot;
          const nc = (r.nonconforming / r.recounts / top) * plot;
          return (
            <g key={r.key}>
              <text x={LABEL - 8} y={y + BAR / 2} textAnchor="end" dominantBaseline="middle" className="fill-ink text-[13px]">
                {r.label.length > 20 ? `${r.label.slice(0, 19)}…` : r.label}
              </text>
              <rect x={LABEL} y={y} width={plot} height={BAR} className="fill-paper-deep" rx={3} />
              <rect x={LABEL} y={y} width={Math.max(w, r.errorRate ? 2 : 0)} height={BAR} className="fill-brass" rx={3} />
              <rect x={LABEL} y={y} width={Math.min(nc, w)} height={BAR} className="fill-fault" rx={3} />
              <text x={LABEL + plot + 6} y={y + BAR / 2} dominantBaseline="middle" className="fill-ink-soft text-[13px] num">
                {formatPercent(r.errorRate)}
              </text>
            </g>
          );
        })}
      </svg>
      <p className="mt-2 flex flex-wrap gap-4 text-xs text-ink-soft">
        <span>
          <span className="mr-1 inline-block size-3 rounded-sm bg-brass align-middle" />
          any difference
        </span>
        <span>
          <span className="mr-1 inline-block size-3 rounded-sm bg-fault align-middle" />
          outside ± U (nonconforming)
        </span>
      </p>
    </figure>
  );
}
