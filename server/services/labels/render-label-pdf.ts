import 'server-only';
import { LabelFitError } from '@/labels/label-content';
import { KitLabelDataError } from '@/labels/kit-element-strings';
import { renderLabels, type LabelTemplate } from '@/labels/render-labels';
import type { StockId } from '@/labels/stocks';
import { AppError } from '../../errors';
import { batchName, loadLabelBatch } from './load-label-batch';

export interface LabelPdf {
  pdf: Uint8Array;
  filename: string;
  pages: number;
  labels: number;
}

// One PDF, one label per id, in the order given.
export async function renderLabelPdf({ template, stock, ids }: { template: LabelTemplate; stock: StockId; ids: number[] }): Promise<LabelPdf> {
  const batch = await loadLabelBatch({ template, stock, ids });
  const name = batchName(batch);
  try {
    const { pdf, pages } = await renderLabels({ ...batch, title: `Tallyforge ${name}` });
    return { pdf, filename: `${name}.pdf`, pages, labels: ids.length };
  } catch (err) {
    // Data that cannot go on this stock (a code too long for its barcode, characters GS1 cannot carry).
    if (err instanceof LabelFitError || err instanceof KitLabelDataError) throw new AppError('rule_violated', err.message, { fields: { stock: err.message } });
    throw err;
  }
}
