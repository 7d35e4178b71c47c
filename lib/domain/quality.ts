// Recount audits: ISO 2859-1's general inspection levels, and where an audit stands.
export const INSPECTION_LEVELS = ['I', 'II', 'III'] as const;
export type InspectionLevel = (typeof INSPECTION_LEVELS)[number];

export const AUDIT_STATUSES = ['open', 'closed'] as const;
export type AuditStatus = (typeof AUDIT_STATUSES)[number];

export const AUDIT_VERDICTS = ['accepted', 'rejected'] as const;
export type AuditVerdict = (typeof AUDIT_VERDICTS)[number];
