import { encodeSymbol, placeSymbol } from '../encode-symbol';
import { bracketed } from '../gs1-element-strings';
import { kitElementStrings, type KitIdentity } from '../kit-element-strings';
import { barHeightFor, clamp, GAP, innerBox } from '../label-box';
import { LabelFitError, type PreparedLabel, type TextRun } from '../label-content';
import { fitModule, QUIET_ZONE } from '../module-size';
import type { LabelStock } from '../stocks';

export interface KitLabelData extends KitIdentity {
  description: string;
}

// A kit label for a build order: the kit, its revision, the order and how many kits it made, as
// GS1-128 (two symbols, each with its bracketed text below, as GS1 asks for human-readable AIs) and one
// GS1 DataMatrix carrying all of it.
export function prepareKitLabel(stock: LabelStock, kit: KitLabelData): PreparedLabel {
  const rows = kitElementStrings(kit);
  const box = innerBox(stock);
  const linear = rows.map((elements) => encodeSymbol({ symbology: 'gs1-128', data: bracketed(elements) }));
  const matrix = encodeSymbol({ symbology: 'gs1datamatrix', data: bracketed(rows.flat()) });

  const widest = Math.max(...linear.map((s) => s.modulesWide));
  const x = fitModule({ modules: widest, quietModules: QUIET_ZONE.code128, available: box.width, candidates: stock.moduleSizes });
  if (!x) throw new LabelFitError(`the kit barcode for ${kit.kitCode} is too long for ${stock.name}`);
  const barHeight = barHeightFor(box, 0.16);
  const hriSize = clamp(x * 14, 6, 10);
  const rowHeight = barHeight + hriSize * 1.3;

  let symbolOps = '';
  const texts: TextRun[] = [];
  linear.forEach((symbol, i) => {
    const rowBottom = box.bottom + (linear.length - 1 - i) * (rowHeight + GAP);
    const left = box.left + QUIET_ZONE.code128 * x;
    symbolOps += placeSymbol(symbol, { left, top: rowBottom + hriSize * 1.3 + barHeight, moduleSize: x, barHeight });
    texts.push({
      text: symbol.data,
      font: 'mono',
      size: hriSize,
      x: left,
      y: rowBottom + hriSize * 0.3,
      maxWidth: box.width - QUIET_ZONE.code128 * x,
      overflow: 'shrink',
    });
  });

  const top = box.bottom + box.height;
  const bandHeight = box.height - linear.length * (rowHeight + GAP);
  const mx = fitModule({
    modules: matrix.modulesWide,
    quietModules: QUIET_ZONE.datamatrix,
    available: Math.min(bandHeight, box.width * 0.4),
    candidates: stock.moduleSizes,
  });
  if (!mx) throw new LabelFitError(`the DataMatrix does not fit on ${stock.name}`);
  const matrixSide = (matrix.modulesWide + 2 * QUIET_ZONE.datamatrix) * mx;
  const right = box.left + box.width;
  symbolOps += placeSymbol(matrix, { left: right - matrixSide + QUIET_ZONE.datamatrix * mx, top: top - QUIET_ZONE.datamatrix * mx, moduleSize: mx });

  const textWidth = box.width - matrixSide - GAP;
  const titleSize = clamp(bandHeight / 4.6, 7, 22);
  const lineSize = Math.max(titleSize * 0.62, 5);
  let baseline = top - titleSize * 0.95;
  texts.push({
    text: `${kit.kitCode} rev ${kit.revision}`,
    font: 'monoBold',
    size: titleSize,
    x: box.left,
    y: baseline,
    maxWidth: textWidth,
    overflow: 'shrink',
  });
  for (const [text, font] of [
    [kit.description, 'sans'],
    [`Build order ${kit.orderNumber}`, 'sans'],
    [`${kit.quantity} ${kit.quantity === 1 ? 'kit' : 'kits'}`, 'sansBold'],
  ] as const) {
    baseline -= lineSize * 1.35;
    texts.push({ text, font, size: lineSize, x: box.left, y: baseline, maxWidth: textWidth, overflow: text === kit.description ? 'ellipsis' : 'shrink' });
  }
  return { symbolOps, texts };
}
