import { DataTypes } from 'sequelize';

// Column types shared by models and migrations, so both always agree.
// Weights are grams; DECIMAL comes back from the driver as a string and is converted at the edge.
export const grams = () => DataTypes.DECIMAL(14, 6);
export const pieceWeight = () => DataTypes.DECIMAL(16, 9);
export const ratio = () => DataTypes.DECIMAL(10, 8);

export { ACCURACY_CLASSES, type AccuracyClass } from '../lib/metrology/accuracy-class';

export const SCALE_STATUSES = ['in_service', 'due', 'locked'] as const;
export type ScaleStatus = (typeof SCALE_STATUSES)[number];

export const CONTAINER_KINDS = ['bag', 'tray', 'tote', 'bin', 'other'] as const;
export type ContainerKind = (typeof CONTAINER_KINDS)[number];

export const COUNTING_METHODS = ['scale', 'hand'] as const;
export type CountingMethod = (typeof COUNTING_METHODS)[number];

export const COUNT_PURPOSES = ['kit_line', 'bin', 'audit', 'part'] as const;
export type CountPurpose = (typeof COUNT_PURPOSES)[number];

export const ORDER_STATUSES = ['draft', 'released', 'in_progress', 'complete', 'cancelled'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const LINE_VERDICTS = ['open', 'in', 'uncertain', 'out'] as const;
export type LineVerdict = (typeof LINE_VERDICTS)[number];

export const RESERVATION_STATUSES = ['active', 'consumed', 'released'] as const;
export type ReservationStatus = (typeof RESERVATION_STATUSES)[number];

// Closed list of why stock moved; adding one needs a migration of the ENUM.
export const MOVEMENT_REASONS = ['initial', 'receipt', 'adjustment', 'consumption'] as const;
export type MovementReason = (typeof MOVEMENT_REASONS)[number];

export const PRINT_JOB_STATUSES = ['queued', 'sent', 'failed'] as const;
export type PrintJobStatus = (typeof PRINT_JOB_STATUSES)[number];

// A sample far from its part's history waits for quality or a planner before it teaches the part anything.
export const SAMPLE_STATUSES = ['accepted', 'held', 'rejected'] as const;
export type SampleStatus = (typeof SAMPLE_STATUSES)[number];

export const ABC_CLASSES = ['A', 'B', 'C'] as const;
export type AbcClass = (typeof ABC_CLASSES)[number];

export { WEIGHT_CLASSES, type WeightClass } from '../lib/metrology/weight-classes';
export const VERIFICATION_STAGES = ['initial', 'in_service'] as const;
export const INSPECTION_LEVELS = ['I', 'II', 'III'] as const;
export const AUDIT_STATUSES = ['open', 'closed'] as const;
export const AUDIT_VERDICTS = ['accepted', 'rejected'] as const;

export const BIN_COUNT_STATUSES = ['applied', 'pending', 'approved', 'rejected'] as const;
export type BinCountStatus = (typeof BIN_COUNT_STATUSES)[number];
