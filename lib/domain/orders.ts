// Where a build order, one of its lines and the stock it holds stand.
export const ORDER_STATUSES = ['draft', 'released', 'in_progress', 'complete', 'cancelled'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const LINE_VERDICTS = ['open', 'in', 'uncertain', 'out'] as const;
export type LineVerdict = (typeof LINE_VERDICTS)[number];

export const RESERVATION_STATUSES = ['active', 'consumed', 'released'] as const;
export type ReservationStatus = (typeof RESERVATION_STATUSES)[number];
