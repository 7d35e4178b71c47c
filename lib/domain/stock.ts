// Containers, bins and why stock moved.
export const CONTAINER_KINDS = ['bag', 'tray', 'tote', 'bin', 'other'] as const;
export type ContainerKind = (typeof CONTAINER_KINDS)[number];

// Closed list of why stock moved; adding one needs a migration of the ENUM.
export const MOVEMENT_REASONS = ['initial', 'receipt', 'adjustment', 'consumption'] as const;
export type MovementReason = (typeof MOVEMENT_REASONS)[number];

export const ABC_CLASSES = ['A', 'B', 'C'] as const;
export type AbcClass = (typeof ABC_CLASSES)[number];

// A bin count's variance: booked at once, waiting for approval, then approved or rejected.
export const BIN_COUNT_STATUSES = ['applied', 'pending', 'approved', 'rejected'] as const;
export type BinCountStatus = (typeof BIN_COUNT_STATUSES)[number];
