'use client';

// A destructive or stock-changing action, asked about once more in plain words before it happens.
export interface PendingConfirm {
  /** What it will do, e.g. "Switch off Rosa Lindqvist? She can no longer sign in until switched on again." */
  question: string;
  /** The button that does it, e.g. "Yes, switch off". */
  yes: string;
  onConfirm(): void | Promise<void>;
  /** A positive action (accept, approve) is not shown as a danger. */
  tone?: 'danger' | 'primary';
  /** A gentler way out offered first, e.g. "Stop, but keep the sample". */
  alternative?: { label: string; onChoose(): void };
}

export function ConfirmBar({ pending, onDone, tone = 'danger' }: { pending: PendingConfirm | null; onDone(): void; tone?: 'danger' | 'primary' }) {
  if (!pending) return null;
  return (
    <div
      role="alertdialog"
      aria-label="Please confirm"
      className="flex flex-wrap items-center gap-3 rounded-md border-2 border-caution bg-paper-card px-4 py-3"
    >
      <p className="min-w-64 flex-1 font-medium">{pending.question}</p>
      {pending.alternative ? (
        <button
          type="button"
          className="btn-primary"
          onClick={() => {
            onDone();
            pending.alternative!.onChoose();
          }}
        >
          {pending.alternative.label}
        </button>
      ) : null}
      <button
        type="button"
        className={(pending.tone ?? tone) === 'danger' ? 'btn-danger' : 'btn-primary'}
        onClick={async () => {
          onDone();
          await pending.onConfirm();
        }}
      >
        {pending.yes}
      </button>
      <button type="button" className="btn-quiet" onClick={onDone}>
        Keep it as it is
      </button>
    </div>
  );
}
