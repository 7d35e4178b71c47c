import 'server-only';
import type { LabelTemplate } from '@/lib/domain/labels';
import type { StockId } from '@/labels/stocks';
import { AppError } from '../../errors';
import { renderInPool } from '../../labels/label-pool';
import { batchName, loadLabelBatch } from './load-label-batch';

export interface LabelPdf {
  pdf: Uint8Array;
  filename: string;
  pages: number;
  labels: number;
  /** Characters the label fonts lack, printed as "?" (see lib/unprintable.ts). */
  unprintable: string[];
}

// One PDF, one label per id, in the order given.
export async function renderLabelPdf({ template, stock, ids }: { template: LabelTemplate; stock: StockId; ids: number[] }): Promise<LabelPdf> {
  const batch = await loadLabelBatch({ template, stock, ids });
  const name = batchName(batch);
  const outcome = await renderInPool({ ...batch, title: `Tallyforge ${name}` });
  // Data that cannot go on this stock (a code too long for its barcode, characters GS1 cannot carry).
  if (!outcome.ok) throw new AppError('rule_violated', outcome.unfit, { fields: { stock: outcome.unfit } });
  return { pdf: outcome.pdf, filename: `${name}.pdf`, pages: outcome.pages, labels: ids.length, unprintable: outcome.unprintable };
}
