/** Average piece weight from a counted sample, and its relative uncertainty (GUM 5.1.6, quotient). */
export interface ApwInput {
  /** Net sample weight W_s. */
  sampleNet: number;
  /** Pieces in the sample, n. */
  sampleQuantity: number;
  /** Coefficient of variation of single-piece weight, c = σ/μ. */
  pieceSpread: number;
  /** Standard uncertainty of the sample's net weight, u(W_s), same unit as sampleNet. */
  sampleNetUncertainty: number;
}

export interface ApwResult {
  averagePieceWeight: number;
  relativeUncertainty: number;
}

export function averagePieceWeight(sampleNet: number, sampleQuantity: number): number {
  return sampleNet / sampleQuantity;
}

/**
 * u_r(APW)² = c²/n + u(W_s)²/W_s²: the sample mean of n pieces has relative
 * spread c/√n, and the weighing adds its own relative uncertainty in quadrature.
 */
export function apwRelativeUncertainty(input: ApwInput): number {
  const { sampleNet, sampleQuantity, pieceSpread, sampleNetUncertainty } = input;
  const fromPieces = (pieceSpread * pieceSpread) / sampleQuantity;
  const fromWeighing = (sampleNetUncertainty * sampleNetUncertainty) / (sampleNet * sampleNet);
  return Math.sqrt(fromPieces + fromWeighing);
}

export function measureApw(input: ApwInput): ApwResult {
  return {
    averagePieceWeight: averagePieceWeight(input.sampleNet, input.sampleQuantity),
    relativeUncertainty: apwRelativeUncertainty(input),
  };
}
