import type { ScaleDto } from '@/lib/contracts/scales';

const STATUS: Record<ScaleDto['status'], { text: string; cls: string }> = {
  in_service: { text: 'In service', cls: 'bg-ok-light text-ok' },
  due: { text: 'Calibration due', cls: 'bg-caution-light text-caution' },
  locked: { text: 'Locked — cannot capture', cls: 'bg-fault-light text-fault' },
};

export function ScaleStatus({ scale }: { scale: ScaleDto }) {
  const s = STATUS[scale.status];
  return (
    <p data-testid="scale-status" data-status={scale.status} className={`rounded-md px-3 py-2 font-bold ${s.cls}`}>
      {s.text}
      {scale.statusReason ? <span className="block font-normal">{scale.statusReason}</span> : null}
    </p>
  );
}

export function ScaleFacts({ scale }: { scale: ScaleDto }) {
  return (
    <p className="num text-sm text-ink-soft">
      Max {scale.capacity} g · d {scale.division} g · class {scale.accuracyClass} · Min {scale.minLoad} g
    </p>
  );
}
