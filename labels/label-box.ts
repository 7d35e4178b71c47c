import type { LabelStock } from './stocks';
import { millimetres } from './units';

// The printable area of a label, in label points (origin bottom-left of the label).
export interface Box {
  left: number;
  bottom: number;
  width: number;
  height: number;
}

export function innerBox(stock: LabelStock): Box {
  return { left: stock.inset, bottom: stock.inset, width: stock.width - 2 * stock.inset, height: stock.height - 2 * stock.inset };
}

export const GAP = millimetres(1.5);

// Linear bar height: a good share of the label, never below 5 mm nor above 25 mm. Handheld scanners
// need a few mm of bar to aim at (common practice).
export function barHeightFor(box: Box, share: number): number {
  return Math.min(Math.max(box.height * share, millimetres(5)), millimetres(25));
}

export function clamp(value: number, min: number, max: number): number {
  return Math.min(Math.max(value, min), max);
}
