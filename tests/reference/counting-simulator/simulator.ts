/**
 * An independent Monte Carlo model of counting parts by weight on a digital scale, to check the
 * product's estimate contract from outside (Monte Carlo propagation of distributions:
 * JCGM 101:2008, GUM Supplement 1). It shares no code with lib/, server/ or app/: its own random
 * numbers, normal draws, rounding and piece model, so a mistake in the product is not repeated here.
 *
 * Physics, per weighing episode (zeroing the scale, then loading it):
 *   reading = round_to_division(true load + zero offset + noise)
 *   noise ~ N(0, s_r²), a fresh draw for every reading (repeatability, GUM 4.2 Type A);
 *   zero offset ~ U[0, 50·d), one draw per episode: what the scale shows with the pan empty
 *   after zeroing is not exactly 0, and nets are taken against the episode's own zero reading.
 *   piece weight w = μ·(1 + c·z), z ~ N(0, 1), floored at a small positive weight.
 */

// ---------------------------------------------------------------------------------------------
// Random numbers

/** 32-bit rotate left. */
function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/**
 * A 32-bit integer finaliser (the murmur3 fmix32 shifts and multipliers, from memory): spreads a
 * seed's bits over the whole word so that seeds 1, 2, 3… give unrelated generator states.
 */
function mix32(x: number): number {
  let h = x | 0;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/** Non-negative integer hash of a string (FNV-1a, 32 bit; constants from memory), to seed by name. */
export function hashString(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/**
 * Seeded generator: the xoshiro128** recurrence (Blackman & Vigna, "Scrambled linear pseudorandom
 * number generators", ACM TOMS 2021; shifts and multipliers from memory), 128-bit state, period
 * 2^128 − 1, ample for the ~10^8 draws of a full grid. simulator.test.ts checks it against
 * published outputs of the reference implementation, and its uniformity.
 */
export class Rng {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;
  private spare: number | null = null;

  /** seed: an integer 0 … 2^53 (fractions are dropped), or the four state words as they are. */
  constructor(seed: number | readonly [number, number, number, number]) {
    if (typeof seed !== 'number') {
      [this.s0, this.s1, this.s2, this.s3] = seed.map((w) => w >>> 0);
      if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) throw new RangeError('Rng: the all-zero state never leaves 0');
      return;
    }
    const whole = Math.floor(Math.abs(seed));
    const lo = whole >>> 0;
    const hi = Math.floor(whole / 4294967296) >>> 0;
    // Four words from the two halves and a step of the golden ratio (2^32/φ), each mixed.
    this.s0 = mix32(lo + 0x9e3779b9);
    this.s1 = mix32(hi ^ mix32(lo + 2 * 0x9e3779b9));
    this.s2 = mix32(lo ^ mix32(hi + 3 * 0x9e3779b9));
    this.s3 = mix32(hi + mix32(lo ^ 0x6a09e667));
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1; // the all-zero state is a fixed point
    for (let i = 0; i < 8; i += 1) this.nextUint32(); // let the seeding settle
  }

  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result;
  }

  /** Uniform on [0, 1) with 53 random bits (two outputs), so normal tails are not cut at 2^-32. */
  uniform(): number {
    const high = this.nextUint32() >>> 5; // 27 bits
    const low = this.nextUint32() >>> 6; // 26 bits
    return (high * 67108864 + low) / 9007199254740992;
  }

  /**
   * Standard normal by the Box–Muller transform (Box & Muller 1958): two uniforms give two
   * independent normals; the second is kept for the next call.
   */
  normal(): number {
    if (this.spare !== null) {
      const z = this.spare;
      this.spare = null;
      return z;
    }
    const u1 = 1 - this.uniform(); // (0, 1]: the log stays finite
    const u2 = this.uniform();
    const r = Math.sqrt(-2 * Math.log(u1));
    const angle = 2 * Math.PI * u2;
    this.spare = r * Math.sin(angle);
    return r * Math.cos(angle);
  }
}

// ---------------------------------------------------------------------------------------------
// Rounding to the division

/** Round half away from zero, written out so it does not lean on Math.round's half-up rule. */
export function roundHalfAwayFromZero(x: number): number {
  const a = Math.abs(x);
  const whole = Math.floor(a);
  const r = a - whole >= 0.5 ? whole + 1 : whole;
  return x < 0 ? -r : r;
}

/** Decimals needed to write d exactly (0.001 → 3, 1 → 0, 0.05 → 2). */
export function decimalsOf(d: number): number {
  for (let k = 0; k <= 12; k += 1) {
    const scaled = d * 10 ** k;
    if (Math.abs(scaled - roundHalfAwayFromZero(scaled)) < 1e-9 * Math.max(1, scaled)) return k;
  }
  return 12;
}

/** k divisions written as a clean decimal: 3 × 0.1 → 0.3, not 0.30000000000000004. */
export function divisionsToWeight(k: number, d: number): number {
  return Number((k * d).toFixed(decimalsOf(d)));
}

/** A weight indicated to the nearest division, as a whole number of divisions. */
export function toDivisions(weight: number, d: number): number {
  return roundHalfAwayFromZero(weight / d);
}

// ---------------------------------------------------------------------------------------------
// Pieces

/** No piece weighs less than this share of μ: a part always has some weight (our choice). */
export const PIECE_FLOOR_FRACTION = 0.01;

/** One piece: w = μ·(1 + c·z), floored at PIECE_FLOOR_FRACTION·μ. */
export function drawPiece(rng: Rng, apw: number, spread: number): number {
  return Math.max(PIECE_FLOOR_FRACTION * apw, apw * (1 + spread * rng.normal()));
}

/**
 * Total weight of m pieces. When the floor lies more than 8 sd below μ (c < 0.124) a piece reaches
 * it with probability below 1e-15, so the pieces are plain normals and their sum is exactly
 * N(m·μ, m·(c·μ)²): one draw instead of m (a bulk of 5 000 costs what one piece does). Otherwise
 * the pieces are drawn one by one.
 */
export function drawPiecesTotal(rng: Rng, count: number, apw: number, spread: number): number {
  if (count <= 0) return 0;
  if (spread * 8 < 1 - PIECE_FLOOR_FRACTION) return count * apw + apw * spread * Math.sqrt(count) * rng.normal();
  let total = 0;
  for (let i = 0; i < count; i += 1) total += drawPiece(rng, apw, spread);
  return total;
}

// ---------------------------------------------------------------------------------------------
// The scale

export interface ScaleModel {
  division: number;
  repeatability: number;
}

/** Zero offsets are drawn over [0, ZERO_OFFSET_DIVISIONS·d). */
export const ZERO_OFFSET_DIVISIONS = 50;

/**
 * One weighing episode: the scale is zeroed once (one offset), then read any number of times.
 * Readings are kept as whole divisions, so nets are exact differences and print as clean decimals.
 */
export class WeighingEpisode {
  readonly zeroOffset: number;

  constructor(
    private readonly rng: Rng,
    private readonly scale: ScaleModel,
  ) {
    this.zeroOffset = rng.uniform() * ZERO_OFFSET_DIVISIONS * scale.division;
  }

  /** Reading with `load` grams on the pan, in divisions. */
  readDivisions(load: number): number {
    const noise = this.scale.repeatability > 0 ? this.scale.repeatability * this.rng.normal() : 0;
    return toDivisions(load + this.zeroOffset + noise, this.scale.division);
  }
}

// ---------------------------------------------------------------------------------------------
// The estimate contract (JSON in, JSON out)

export interface EstimateRequest {
  unit: 'g';
  scale: { division: number; repeatability: number; max: number; min: number };
  sample: { quantity: number; netWeight: number; increments?: number[] };
  netWeight: number;
  sampleOnPan: boolean;
  pieceSpread?: number;
  tare?: number;
  targetQuantity?: number;
}

/** The response fields the grid reads; anything may be missing from a product mid-rewrite. */
export interface EstimateResponse {
  count?: number;
  countRaw?: number;
  expandedUncertainty?: number;
  exact?: boolean;
  probabilityExact?: number;
  wholePieceRange?: number;
  warnings?: { code: string; message: string }[];
  /** An HTTP adapter may hand back an error body instead of throwing. */
  status?: unknown;
  error?: unknown;
}

/** The adapter: the pure function, or an HTTP call made synchronous by the caller. */
export type Estimator = (request: EstimateRequest) => EstimateResponse;

// ---------------------------------------------------------------------------------------------
// Regimes and trials

/** What the request tells the product about c: the true value, nothing, or K observed increments. */
export type SpreadKnowledge = 'known' | 'unknown' | 'learned5' | 'learned10' | 'learned25';
/** onPan: sample stays on the pan and pieces are added; apart: the bulk is weighed on its own zero. */
export type Geometry = 'onPan' | 'apart';

export interface Regime {
  /** c = σ/μ of one piece's weight. */
  spread: number;
  knowledge: SpreadKnowledge;
  /** n, pieces counted into the sample. */
  sampleQuantity: number;
  /** N, the true count of the load (the whole pan on the pan). */
  quantity: number;
  /** d, g. */
  division: number;
  /** μ, the part's mean piece weight, g. */
  apw: number;
  /** s_r, g. */
  repeatability: number;
  geometry: Geometry;
}

export const LEARNED_INCREMENTS: Readonly<Record<SpreadKnowledge, number>> = {
  known: 0,
  unknown: 0,
  learned5: 5,
  learned10: 10,
  learned25: 25,
};

export interface Trial {
  truth: number;
  request: EstimateRequest;
  /**
   * Why an operator could not send this trial, or null. The contract refuses a sample net of 0
   * or less, and a real operator seeing it would not press count; such trials are tallied apart
   * (they only happen when the sample is lighter than a few divisions).
   */
  unsendable: string | null;
}

/** Capacity well above any load of the regime, so capacity warnings stay out of the way. */
export function scaleMax(regime: Regime): number {
  const wanted = Math.max(10 * regime.quantity * regime.apw, 1000 * regime.division);
  return divisionsToWeight(Math.ceil(wanted / regime.division - 1e-9), regime.division);
}

export interface OneByOne {
  /** The zero reading and the reading after each piece, in divisions. */
  zero: number;
  readings: number[];
  /** Consecutive reading differences in g, the first from the zero reading. */
  increments: number[];
}

/** K pieces of the same part placed one at a time in one weighing episode, read after each. */
export function placeOneByOne(rng: Rng, regime: Regime, count: number): OneByOne {
  const episode = new WeighingEpisode(rng, regime);
  const zero = episode.readDivisions(0);
  const readings: number[] = [];
  const increments: number[] = [];
  let load = 0;
  let previous = zero;
  for (let i = 0; i < count; i += 1) {
    load += drawPiece(rng, regime.apw, regime.spread);
    const reading = episode.readDivisions(load);
    readings.push(reading);
    increments.push(divisionsToWeight(reading - previous, regime.division));
    previous = reading;
  }
  return { zero, readings, increments };
}

/** Sample and load nets, in divisions, for the regime's geometry. */
function weighSampleAndLoad(rng: Rng, regime: Regime): { sample: number; load: number } {
  const n = regime.sampleQuantity;
  const N = regime.quantity;
  const first = new WeighingEpisode(rng, regime);
  const zero = first.readDivisions(0);
  const sampleWeight = drawPiecesTotal(rng, n, regime.apw, regime.spread);
  const sample = first.readDivisions(sampleWeight) - zero;
  if (regime.geometry === 'onPan') {
    // N − n more pieces join the sample; the whole pan is read against the same zero.
    const whole = sampleWeight + drawPiecesTotal(rng, N - n, regime.apw, regime.spread);
    return { sample, load: first.readDivisions(whole) - zero };
  }
  // The sample is set aside; N fresh pieces on a freshly zeroed pan (a new episode, new offset).
  const second = new WeighingEpisode(rng, regime);
  const zeroAgain = second.readDivisions(0);
  const bulk = drawPiecesTotal(rng, N, regime.apw, regime.spread);
  return { sample, load: second.readDivisions(bulk) - zeroAgain };
}

/** One count of the regime: the request an operator's weighings produce, and the true count. */
export function simulateTrial(rng: Rng, regime: Regime): Trial {
  const d = regime.division;
  const weighed = weighSampleAndLoad(rng, regime);
  const k = LEARNED_INCREMENTS[regime.knowledge];
  const sample: EstimateRequest['sample'] = {
    quantity: regime.sampleQuantity,
    netWeight: divisionsToWeight(weighed.sample, d),
  };
  if (k > 0) sample.increments = placeOneByOne(rng, regime, k).increments;
  const request: EstimateRequest = {
    unit: 'g',
    scale: { division: d, repeatability: regime.repeatability, max: scaleMax(regime), min: 0 },
    sample,
    netWeight: divisionsToWeight(weighed.load, d),
    sampleOnPan: regime.geometry === 'onPan',
  };
  if (regime.knowledge === 'known') request.pieceSpread = regime.spread;
  let unsendable: string | null = null;
  if (weighed.sample <= 0) unsendable = `sample reads ${sample.netWeight} g net`;
  else if (weighed.load < 0) unsendable = `load reads ${request.netWeight} g net`;
  return { truth: regime.quantity, request, unsendable };
}
