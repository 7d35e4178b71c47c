import type { LabelStock } from './stocks';

export interface LabelSlot {
  page: number;
  // Bottom-left corner of the label on its page, in PDF points (y grows upwards).
  x: number;
  y: number;
}

export function labelsPerPage(stock: LabelStock): number {
  return stock.sheet ? stock.sheet.columns * stock.sheet.rows : 1;
}

export function pageSize(stock: LabelStock): { width: number; height: number } {
  return stock.sheet ? { width: stock.sheet.pageWidth, height: stock.sheet.pageHeight } : { width: stock.width, height: stock.height };
}

// Where label `index` goes: a roll gives each label its own page; a sheet fills rows left to right, top down.
export function labelSlot(stock: LabelStock, index: number): LabelSlot {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`label index must be a whole number ≥ 0, got ${index}`);
  const sheet = stock.sheet;
  if (!sheet) return { page: index, x: 0, y: 0 };
  const perPage = sheet.columns * sheet.rows;
  const onPage = index % perPage;
  const column = onPage % sheet.columns;
  const row = Math.floor(onPage / sheet.columns);
  const top = sheet.pageHeight - sheet.top - row * sheet.pitchY;
  return { page: Math.floor(index / perPage), x: sheet.left + column * sheet.pitchX, y: top - stock.height };
}
