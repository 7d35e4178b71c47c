import { createRandom } from '../scale/prng';

/**
 * Picks `size` items at random without replacement (a partial Fisher–Yates shuffle), reproducibly:
 * the same seed and population give the same sample, so an audit's selection can be re-checked.
 */
export function selectSample<T>(population: readonly T[], size: number, seed: number): T[] {
  const items = [...population];
  const random = createRandom(seed);
  const n = Math.min(size, items.length);
  for (let i = 0; i < n; i++) {
    const j = i + Math.floor(random.next() * (items.length - i));
    [items[i], items[j]] = [items[j], items[i]];
  }
  return items.slice(0, n);
}
