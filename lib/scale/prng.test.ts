import { describe, expect, it } from 'vitest';
import { createRandom } from './prng';

describe('createRandom', () => {
  it('repeats the same stream for the same seed', () => {
    const a = createRandom(42);
    const b = createRandom(42);
    const fromA = Array.from({ length: 20 }, () => a.next());
    expect(Array.from({ length: 20 }, () => b.next())).toEqual(fromA);
  });

  it('gives a different stream for a different seed', () => {
    expect(createRandom(1).next()).not.toBe(createRandom(2).next());
  });

  it('draws uniforms on [0, 1) with mean 1/2 and variance 1/12', () => {
    const random = createRandom(2024);
    const xs = Array.from({ length: 100000 }, () => random.next());
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (xs.length - 1);
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...xs)).toBeLessThan(1);
    // Standard error of the mean: √(1/12/1e5) = 0.0009; 0.004 is over 4 se.
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.004);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.002);
  });

  it('draws normals with mean 0, unit variance and about 95 % within ±1.96', () => {
    const random = createRandom(7);
    const zs = Array.from({ length: 100000 }, () => random.normal());
    const mean = zs.reduce((s, z) => s + z, 0) / zs.length;
    const variance = zs.reduce((s, z) => s + (z - mean) ** 2, 0) / (zs.length - 1);
    const inside = zs.filter((z) => Math.abs(z) < 1.96).length / zs.length;
    expect(Math.abs(mean)).toBeLessThan(0.015);
    expect(Math.abs(variance - 1)).toBeLessThan(0.02);
    expect(Math.abs(inside - 0.95)).toBeLessThan(0.004);
  });
});
