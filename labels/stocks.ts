import { inches, millimetres } from './units';
import { LABEL_STOCK_IDS, type StockId } from '../lib/domain/labels';

// Label stocks as data. Thermal rolls print one label per page; a sheet prints a grid per page.
// Sizes are all in PDF points.
export interface SheetGrid {
  pageWidth: number;
  pageHeight: number;
  columns: number;
  rows: number;
  // Top-left corner of the first label, and the distance from one label's corner to the next.
  left: number;
  top: number;
  pitchX: number;
  pitchY: number;
}

export interface LabelStock {
  id: string;
  name: string;
  width: number;
  height: number;
  // Keep ink this far inside the die cut: thermal registration and laser sheet drift both wander.
  inset: number;
  // X dimensions the layout may choose from, largest first (see MODULE_SIZES).
  moduleSizes: readonly number[];
  sheet?: SheetGrid;
}

// Module sizes that land on whole dots of a 203 dpi (8 dots/mm) thermal head — common practice for
// thermal label printers — and print cleanly on 300 dpi heads and 600 dpi lasers too: 0.5 mm (4 dots),
// 0.375 mm (3 dots), 0.25 mm (2 dots, about 10 mil, the usual lower limit for reliable contact and
// handheld scanning; common practice).
export const MODULE_SIZES = { large: millimetres(0.5), medium: millimetres(0.375), small: millimetres(0.25) } as const;
const allModuleSizes = [MODULE_SIZES.large, MODULE_SIZES.medium, MODULE_SIZES.small] as const;

const STOCKS = {
  '4x6in': { id: '4x6in', name: '4 × 6 in thermal', width: inches(4), height: inches(6), inset: inches(0.12), moduleSizes: allModuleSizes },
  '4x2in': { id: '4x2in', name: '4 × 2 in thermal', width: inches(4), height: inches(2), inset: inches(0.08), moduleSizes: allModuleSizes },
  '2x1in': {
    id: '2x1in',
    name: '2 × 1 in thermal',
    width: inches(2),
    height: inches(1),
    inset: inches(0.05),
    moduleSizes: [MODULE_SIZES.medium, MODULE_SIZES.small],
  },
  // Letter sheet, 3 columns × 10 rows of 2⅝ × 1 in labels: 3/16 in side margins, ½ in top margin,
  // ⅛ in gutter between columns, no gap between rows (common practice for 30-up address sheets;
  // dimensions from memory — check against the sheet you buy).
  'letter-30up': {
    id: 'letter-30up',
    name: 'Letter sheet, 30 labels of 2⅝ × 1 in',
    width: inches(2.625),
    height: inches(1),
    inset: inches(0.06),
    moduleSizes: [MODULE_SIZES.medium, MODULE_SIZES.small],
    sheet: {
      pageWidth: inches(8.5),
      pageHeight: inches(11),
      columns: 3,
      rows: 10,
      left: inches(0.1875),
      top: inches(0.5),
      pitchX: inches(2.75),
      pitchY: inches(1),
    },
  },
} as const satisfies Record<StockId, LabelStock>;

export type { StockId };
export const LABEL_STOCKS: Record<StockId, LabelStock> = STOCKS;
export const STOCK_IDS = LABEL_STOCK_IDS;

export function isStockId(value: string): value is StockId {
  return Object.hasOwn(LABEL_STOCKS, value);
}
