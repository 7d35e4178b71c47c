import { describe, expect, it } from 'vitest';
import { fitText } from './fit-text';

// A monospaced measure: every character half the size wide.
const measure = (text: string, size: number) => text.length * size * 0.5;

describe('fitText', () => {
  it('leaves a text that fits as it is', () => {
    expect(fitText('K-04-2-07', { size: 10, maxWidth: 45, overflow: 'shrink' }, measure)).toEqual({ text: 'K-04-2-07', size: 10 });
  });

  it('shrinks a code until it fits, never cutting it', () => {
    const fitted = fitText('K-04-2-07', { size: 10, maxWidth: 30, overflow: 'shrink' }, measure);
    expect(fitted.text).toBe('K-04-2-07');
    expect(measure(fitted.text, fitted.size)).toBeCloseTo(30, 9);
  });

  it('ends free text with an ellipsis at the longest prefix that fits', () => {
    const fitted = fitText('Pan head screw M3 x 8', { size: 10, maxWidth: 50, overflow: 'ellipsis' }, measure);
    expect(fitted).toEqual({ text: 'Pan head…', size: 10 });
    expect(measure(fitted.text, 10)).toBeLessThanOrEqual(50);
  });

  it('gives up on the text rather than overflow when not even the ellipsis fits', () => {
    expect(fitText('Washer', { size: 10, maxWidth: 3, overflow: 'ellipsis' }, measure)).toEqual({ text: '', size: 10 });
  });
});
