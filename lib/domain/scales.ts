// The words a scale's record is kept in. Models, schemas, pages and client code all take them from here;
// a migration keeps its own copy, as it shipped.
export const SCALE_STATUSES = ['in_service', 'due', 'locked'] as const;
export type ScaleStatus = (typeof SCALE_STATUSES)[number];

// When a calibration was made: at first verification or in service (OIML R 76-1 keeps the two apart).
export const VERIFICATION_STAGES = ['initial', 'in_service'] as const;
export type VerificationStage = (typeof VERIFICATION_STAGES)[number];
