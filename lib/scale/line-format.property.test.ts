import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { WEIGHT_UNITS } from '../weighing/units';
import { LINE_PROFILES } from './line-format';
import { LineFramer } from './line-framer';
import { formatLine, parseLine } from './parse-line';

const anyText = fc.string({ unit: 'binary', maxLength: 120 });
const printableLine = fc.string({ unit: fc.integer({ min: 0x20, max: 0x7e }).map((c) => String.fromCharCode(c)), minLength: 1, maxLength: 40 });
const terminator = fc.constantFrom('\r\n', '\n', '\r');

/** Cut a string at arbitrary points. */
function cutAt(text: string, cuts: number[]): string[] {
  const points = [...new Set(cuts.map((c) => c % (text.length + 1)))].sort((a, b) => a - b);
  const parts: string[] = [];
  let from = 0;
  for (const p of points) {
    parts.push(text.slice(from, p));
    from = p;
  }
  parts.push(text.slice(from));
  return parts;
}

describe('line parsing properties', () => {
  it('never throws on arbitrary text, for every profile', () => {
    fc.assert(
      fc.property(fc.constantFrom(...LINE_PROFILES), anyText, (profile, text) => {
        const r = parseLine(profile, text);
        expect(typeof r.ok).toBe('boolean');
      }),
      { numRuns: 2000, seed: 1 },
    );
  });

  it('reads back what it wrote, for every profile', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...LINE_PROFILES),
        fc.integer({ min: -99_999_999, max: 99_999_999 }),
        fc.integer({ min: 0, max: 4 }),
        fc.constantFrom(...WEIGHT_UNITS),
        fc.boolean(),
        (profile, steps, decimals, unit, stable) => {
          const gross = Number((steps / 10 ** decimals).toFixed(decimals)) || 0;
          const fields = profile.template.includes('{unit}') ? { gross, unit, stable } : { gross, unit: profile.defaultUnit };
          const r = parseLine(profile, formatLine(profile, fields, decimals));
          const expected = profile.flags ? fields : { gross, unit: fields.unit };
          expect(r).toEqual({ ok: true, fields: expected });
        },
      ),
      { numRuns: 1000, seed: 2 },
    );
  });
});

describe('framing properties', () => {
  it('never throws on arbitrary chunks and never returns a line with CR or LF', () => {
    fc.assert(
      fc.property(fc.array(anyText, { maxLength: 20 }), (chunks) => {
        const framer = new LineFramer();
        const lines = chunks.flatMap((c) => framer.push(c)).concat(framer.flush());
        for (const line of lines) expect(/[\r\n]/.test(line)).toBe(false);
      }),
      { numRuns: 1000, seed: 3 },
    );
  });

  it('gives the same lines however the stream is cut into chunks', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(printableLine, terminator), { minLength: 1, maxLength: 15 }), fc.array(fc.nat(), { maxLength: 30 }), (framed, cuts) => {
        const stream = framed.map(([line, end]) => line + end).join('');
        const framer = new LineFramer();
        const lines = cutAt(stream, cuts).flatMap((chunk) => framer.push(chunk));
        expect(lines).toEqual(framed.map(([line]) => line));
        expect(framer.malformed).toBe(0);
      }),
      { numRuns: 1000, seed: 4 },
    );
  });
});
