import { describe, expect, it } from 'vitest';
import { labelSlot, labelsPerPage, pageSize } from './sheet-layout';
import { LABEL_STOCKS } from './stocks';
import { inches } from './units';

describe('sheet layout', () => {
  const sheet = LABEL_STOCKS['letter-30up'];

  it('puts the first label ½ in from the top and 3/16 in from the left of a Letter page', () => {
    expect(pageSize(sheet)).toEqual({ width: inches(8.5), height: inches(11) });
    expect(labelSlot(sheet, 0)).toEqual({ page: 0, x: inches(0.1875), y: inches(11 - 0.5 - 1) });
  });

  it('fills a row left to right at the 2¾ in pitch, then moves down one inch', () => {
    expect(labelSlot(sheet, 2).x).toBeCloseTo(inches(0.1875 + 2 * 2.75), 9);
    expect(labelSlot(sheet, 3)).toMatchObject({ page: 0, x: inches(0.1875) });
    expect(labelSlot(sheet, 3).y).toBeCloseTo(inches(11 - 0.5 - 2), 9);
  });

  it('keeps the whole grid on the page, symmetric left and right, and starts a new page after 30', () => {
    const last = labelSlot(sheet, 29);
    expect(last.page).toBe(0);
    expect(last.y).toBeCloseTo(inches(0.5), 9);
    expect(inches(8.5) - (last.x + sheet.width)).toBeCloseTo(inches(0.1875), 9);
    expect(labelSlot(sheet, 30)).toEqual({ ...labelSlot(sheet, 0), page: 1 });
    expect(labelsPerPage(sheet)).toBe(30);
  });

  it('gives every roll label its own page the size of the label', () => {
    const roll = LABEL_STOCKS['4x2in'];
    expect(labelSlot(roll, 7)).toEqual({ page: 7, x: 0, y: 0 });
    expect(pageSize(roll)).toEqual({ width: 288, height: 144 });
    expect(() => labelSlot(roll, -1)).toThrow(RangeError);
  });
});
