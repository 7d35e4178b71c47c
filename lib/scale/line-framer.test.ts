import { describe, expect, it } from 'vitest';
import { LineFramer } from './line-framer';

describe('LineFramer', () => {
  it('splits on CR LF, LF alone and CR alone', () => {
    const framer = new LineFramer();
    expect(framer.push('a\r\nb\nc\rd')).toEqual(['a', 'b', 'c']);
    expect(framer.flush()).toEqual(['d']);
  });

  it('joins a line split across chunks, even between CR and LF', () => {
    const framer = new LineFramer();
    expect(framer.push('@ +00')).toEqual([]);
    expect(framer.push('12.3 g\r')).toEqual(['@ +0012.3 g']);
    expect(framer.push('\n@ +0012.4 g\r\n')).toEqual(['@ +0012.4 g']);
  });

  it('drops and counts a runaway line, then carries on', () => {
    const framer = new LineFramer(10);
    expect(framer.push('x'.repeat(25))).toEqual([]);
    expect(framer.push('yy\r\nok\r\n')).toEqual(['ok']);
    expect(framer.malformed).toBe(1);
  });

  it('drops and counts lines holding control characters', () => {
    const framer = new LineFramer();
    expect(framer.push('12.5\u0000\n\u000212.6\n12.7\tg\n')).toEqual(['12.7\tg']);
    expect(framer.malformed).toBe(2);
  });
});
