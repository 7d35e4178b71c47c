import { placeSymbol, type EncodedSymbol } from '../encode-symbol';
import { barHeightFor, clamp, GAP, innerBox } from '../label-box';
import { LabelFitError, type LabelFont, type PreparedLabel, type TextRun } from '../label-content';
import { fitModule, QUIET_ZONE } from '../module-size';
import type { LabelStock } from '../stocks';

export interface CodeLabelText {
  text: string;
  font: LabelFont;
  overflow: TextRun['overflow'];
}

// The shared shape of bin and part labels: a title and up to two lines top left, a QR code top right,
// and a Code 128 across the bottom, so the linear symbol gets the label's full width.
export function layoutCodeLabel(
  stock: LabelStock,
  { title, lines, linear, qr }: { title: CodeLabelText; lines: CodeLabelText[]; linear: EncodedSymbol; qr: EncodedSymbol },
): PreparedLabel {
  const box = innerBox(stock);
  const x = fitModule({ modules: linear.modulesWide, quietModules: QUIET_ZONE.code128, available: box.width, candidates: stock.moduleSizes });
  if (!x) throw new LabelFitError(`"${linear.data}" is too long for a Code 128 on ${stock.name}`);
  const barHeight = barHeightFor(box, 0.36);
  const bandHeight = box.height - barHeight - GAP;

  const qx = fitModule({
    modules: qr.modulesWide,
    quietModules: QUIET_ZONE.qrcode,
    available: Math.min(bandHeight, box.width * 0.45),
    candidates: stock.moduleSizes,
  });
  if (!qx) throw new LabelFitError(`the QR code does not fit on ${stock.name}`);
  const qrSide = (qr.modulesWide + 2 * QUIET_ZONE.qrcode) * qx;
  const top = box.bottom + box.height;
  const right = box.left + box.width;

  const symbolOps =
    placeSymbol(linear, { left: box.left + QUIET_ZONE.code128 * x, top: box.bottom + barHeight, moduleSize: x, barHeight }) +
    placeSymbol(qr, { left: right - qrSide + QUIET_ZONE.qrcode * qx, top: top - QUIET_ZONE.qrcode * qx, moduleSize: qx });

  // Title and lines share the band beside the QR code: the title 1⅔ the size of the lines, 1.2 leading.
  const textWidth = box.width - qrSide - GAP;
  const titleSize = clamp(bandHeight / (1.2 * (1 + 0.6 * Math.max(lines.length, 1))), 6, 30);
  const lineSize = Math.max(titleSize * 0.6, 5);
  const texts: TextRun[] = [];
  let baseline = top - titleSize * 0.95;
  texts.push({ ...title, size: titleSize, x: box.left, y: baseline, maxWidth: textWidth });
  baseline -= titleSize * 0.25;
  for (const line of lines) {
    baseline -= lineSize * 1.2;
    texts.push({ ...line, size: lineSize, x: box.left, y: baseline, maxWidth: textWidth });
  }
  return { symbolOps, texts };
}
