import 'server-only';
import type { LabelBatch } from '@/labels/render-labels';
import type { LabelTemplate } from '@/lib/domain/labels';
import type { StockId } from '@/labels/stocks';
import { loadBinLabels } from './load-bin-labels';
import { loadKitLabels } from './load-kit-labels';
import { loadPartLabels } from './load-part-labels';

export async function loadLabelBatch({ template, stock, ids }: { template: LabelTemplate; stock: StockId; ids: number[] }): Promise<LabelBatch> {
  switch (template) {
    case 'bin':
      return { template, stock, items: await loadBinLabels({ ids }) };
    case 'part':
      return { template, stock, items: await loadPartLabels({ ids }) };
    case 'kit':
      return { template, stock, items: await loadKitLabels({ ids }) };
  }
}

// What the labels are of, for file and job names: the code when there is one label.
export function batchName(batch: LabelBatch): string {
  const first = batch.items[0];
  const code =
    batch.template === 'bin'
      ? (first as { binCode: string }).binCode
      : batch.template === 'part'
        ? (first as { partNumber: string }).partNumber
        : (first as { orderNumber: string }).orderNumber;
  const what = batch.items.length === 1 ? code : `${batch.items.length}-labels`;
  return `${batch.template}-${what}-${batch.stock}`.replace(/[^A-Za-z0-9._-]/g, '_');
}
