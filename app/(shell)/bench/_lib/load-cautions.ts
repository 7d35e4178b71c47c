/** Load and lifting cautions shown beside the live weight. */

/** Share of Max from which a load is flagged as near capacity (our choice: 90 %). */
export const NEAR_CAPACITY_SHARE = 0.9;
/** Load constant of the revised NIOSH lifting equation, 23 kg (Waters et al. 1993, NIOSH 94-110). */
export const NIOSH_LOAD_CONSTANT_G = 23_000;

export type CapacityLevel = 'ok' | 'near' | 'over';

export interface LoadAssessment {
  level: CapacityLevel;
  /** Gross as a share of Max. */
  share: number;
  /** A container this heavy needs two people or a platform. */
  heavyLift: boolean;
}

export function assessLoad(input: { gross: number; capacity: number; containerWeight?: number | null }): LoadAssessment {
  const share = input.capacity > 0 ? input.gross / input.capacity : 0;
  const level: CapacityLevel = share > 1 ? 'over' : share >= NEAR_CAPACITY_SHARE ? 'near' : 'ok';
  // The filled container is what gets lifted: take the larger of the load and the container's tare.
  const lifted = Math.max(input.gross, input.containerWeight ?? 0);
  return { level, share, heavyLift: lifted > NIOSH_LOAD_CONSTANT_G };
}
