// Words for order states and line verdicts: colour is never the only signal.
import type { LineVerdict, OrderStatus } from './domain/orders';

export const ORDER_STATUS_WORDS: Record<OrderStatus, string> = {
  draft: 'Draft',
  released: 'Released',
  in_progress: 'Being kitted',
  complete: 'Complete',
  cancelled: 'Cancelled',
};

export const VERDICT_WORDS: Record<LineVerdict, string> = {
  open: 'Open',
  in: 'In tolerance',
  uncertain: 'Uncertain',
  out: 'Out of tolerance',
};

export const VERDICT_STYLE: Record<LineVerdict, string> = {
  open: 'bg-paper-deep text-ink-soft',
  in: 'bg-ok-light text-ok',
  uncertain: 'bg-caution-light text-caution',
  out: 'bg-fault-light text-fault',
};

export const STATUS_STYLE: Record<OrderStatus, string> = {
  draft: 'bg-paper-deep text-ink-soft',
  released: 'bg-forge-light text-forge-dark',
  in_progress: 'bg-brass-light text-brass-dark',
  complete: 'bg-ok-light text-ok',
  cancelled: 'bg-paper-deep text-ink-faint line-through',
};
