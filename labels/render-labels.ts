import { assembleLabelsPdf, type LabelPdfFile } from './assemble-pdf';
import type { PreparedLabel } from './label-content';
import { LABEL_STOCKS, type StockId } from './stocks';
import { labelsPerPage } from './sheet-layout';
import { prepareBinLabel, type BinLabelData } from './templates/bin-label';
import { prepareKitLabel, type KitLabelData } from './templates/kit-label';
import { preparePartLabel, type PartLabelData } from './templates/part-label';

export type LabelBatch =
  | { template: 'bin'; stock: StockId; items: BinLabelData[] }
  | { template: 'part'; stock: StockId; items: PartLabelData[] }
  | { template: 'kit'; stock: StockId; items: KitLabelData[] };

// Encodes and lays out every label of a batch (the CPU-heavy half: bwip-js encoding).
export function prepareLabels(batch: LabelBatch): PreparedLabel[] {
  const stock = LABEL_STOCKS[batch.stock];
  switch (batch.template) {
    case 'bin':
      return batch.items.map((item) => prepareBinLabel(stock, item));
    case 'part':
      return batch.items.map((item) => preparePartLabel(stock, item));
    case 'kit':
      return batch.items.map((item) => prepareKitLabel(stock, item));
  }
}

export async function renderLabels(batch: LabelBatch & { title: string }): Promise<LabelPdfFile & { pages: number }> {
  const stock = LABEL_STOCKS[batch.stock];
  const file = await assembleLabelsPdf({ stock, labels: prepareLabels(batch), title: batch.title });
  return { ...file, pages: Math.ceil(batch.items.length / labelsPerPage(stock)) };
}
