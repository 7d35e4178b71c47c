import type { ScaleDto } from '@/lib/contracts/scales';

const LOOK: Record<ScaleDto['status'], { label: string; mark: string; style: string }> = {
  in_service: { label: 'In service', mark: '●', style: 'bg-ok-light text-ok' },
  due: { label: 'Calibration due', mark: '◐', style: 'bg-caution-light text-caution' },
  locked: { label: 'Locked out', mark: '✕', style: 'bg-fault-light text-fault' },
};

// Status in words, a shape and a colour, so it reads without colour vision too.
export function ScaleStatus({ scale, withReason = false }: { scale: Pick<ScaleDto, 'status' | 'statusReason'>; withReason?: boolean }) {
  const look = LOOK[scale.status];
  return (
    <span className="inline-flex flex-col gap-1" data-testid="scale-status">
      <span className={`inline-flex w-fit items-center gap-1.5 rounded px-2 py-0.5 text-sm font-medium ${look.style}`}>
        <span aria-hidden="true">{look.mark}</span>
        {look.label}
      </span>
      {withReason && scale.statusReason ? <span className="text-sm text-ink-soft">{scale.statusReason}</span> : null}
    </span>
  );
}
