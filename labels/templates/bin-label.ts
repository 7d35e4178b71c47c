import { encodeSymbol } from '../encode-symbol';
import type { PreparedLabel } from '../label-content';
import type { LabelStock } from '../stocks';
import { layoutCodeLabel } from './code-label-layout';

export interface BinLabelData {
  binCode: string;
  partNumber: string;
  description: string;
  partUrl: string;
}

// A bin front: the Code 128 carries exactly the bin code (what a cycle count scans), the QR the part page.
export function prepareBinLabel(stock: LabelStock, bin: BinLabelData): PreparedLabel {
  return layoutCodeLabel(stock, {
    title: { text: bin.binCode, font: 'monoBold', overflow: 'shrink' },
    lines: [
      { text: bin.partNumber, font: 'mono', overflow: 'shrink' },
      { text: bin.description, font: 'sans', overflow: 'ellipsis' },
    ],
    linear: encodeSymbol({ symbology: 'code128', data: bin.binCode }),
    qr: encodeSymbol({ symbology: 'qrcode', data: bin.partUrl }),
  });
}
