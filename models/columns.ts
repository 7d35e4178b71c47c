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
