// What a part is counted by, what a capture was for, and where a learned sample stands.
export const COUNTING_METHODS = ['scale', 'hand'] as const;
export type CountingMethod = (typeof COUNTING_METHODS)[number];

export const COUNT_PURPOSES = ['kit_line', 'bin', 'audit', 'part'] as const;
export type CountPurpose = (typeof COUNT_PURPOSES)[number];

// A sample far from its part's history waits for quality or a planner before it teaches the part anything.
export const SAMPLE_STATUSES = ['accepted', 'held', 'rejected'] as const;
export type SampleStatus = (typeof SAMPLE_STATUSES)[number];
