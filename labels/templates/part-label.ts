import { encodeSymbol } from '../encode-symbol';
import type { PreparedLabel } from '../label-content';
import type { LabelStock } from '../stocks';
import { layoutCodeLabel } from './code-label-layout';

export interface PartLabelData {
  partNumber: string;
  description: string;
  partUrl: string;
}

// A part label (bags, trays, drawings): the Code 128 carries the part number, the QR the part page.
export function preparePartLabel(stock: LabelStock, part: PartLabelData): PreparedLabel {
  return layoutCodeLabel(stock, {
    title: { text: part.partNumber, font: 'monoBold', overflow: 'shrink' },
    lines: [{ text: part.description, font: 'sans', overflow: 'ellipsis' }],
    linear: encodeSymbol({ symbology: 'code128', data: part.partNumber }),
    qr: encodeSymbol({ symbology: 'qrcode', data: part.partUrl }),
  });
}
