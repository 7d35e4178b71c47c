import type { LoadAssessment } from '../_lib/load-cautions';

// Capacity always in view; near and over Max flagged; heavy containers get a lifting note.
export function LoadNotes({ capacity, load }: { capacity: number; load: LoadAssessment | null }) {
  const pct = load ? Math.round(load.share * 100) : 0;
  return (
    <div className="space-y-2 text-sm" data-testid="load-notes">
      <p className="text-ink-soft">
        Capacity Max <span className="num font-bold text-ink">{capacity} g</span> · pan at <span className="num">{pct} %</span>
      </p>
      {load?.level === 'over' ? (
        <p className="rounded-md bg-fault-light px-3 py-2 font-bold text-fault">Over capacity: take weight off now — the reading cannot be used.</p>
      ) : null}
      {load?.level === 'near' ? (
        <p className="rounded-md bg-caution-light px-3 py-2 font-bold text-caution">Close to capacity ({pct} % of Max): count the rest in a second batch.</p>
      ) : null}
      {load?.heavyLift ? (
        <p className="rounded-md bg-caution-light px-3 py-2 text-caution">
          Heavier than 23 kg (the load constant of the revised NIOSH lifting equation): lift with two people, or weigh on a floor platform.
        </p>
      ) : null}
    </div>
  );
}
