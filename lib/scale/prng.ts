/**
 * Seeded random numbers for the simulator and the Monte Carlo checks.
 * mulberry32 (a well-known 32-bit generator, public domain) for uniforms,
 * Box–Muller for normals. Same seed, same stream, on every platform.
 */
export interface Random {
  /** Uniform on [0, 1). */
  next(): number;
  /** Standard normal N(0, 1). */
  normal(): number;
}

export function createRandom(seed: number): Random {
  let state = seed >>> 0;
  let spare: number | null = null;
  const next = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let x = state;
    x = Math.imul(x ^ (x >>> 15), x | 1);
    x ^= x + Math.imul(x ^ (x >>> 7), x | 61);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
  const normal = (): number => {
    if (spare !== null) {
      const z = spare;
      spare = null;
      return z;
    }
    const u1 = 1 - next(); // (0, 1]: keeps log() finite
    const u2 = next();
    const radius = Math.sqrt(-2 * Math.log(u1));
    spare = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  };
  return { next, normal };
}
