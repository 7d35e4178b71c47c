// Worker for scripts/bench-labels.ts: encodes and lays out the bin labels it is sent, and sends them back.
import { parentPort } from 'node:worker_threads';
import { prepareLabels } from '../../labels/render-labels';
import type { BinLabelData } from '../../labels/templates/bin-label';
import type { StockId } from '../../labels/stocks';

parentPort!.on('message', ({ seq, stock, items }: { seq: number; stock: StockId; items: BinLabelData[] }) => {
  parentPort!.postMessage({ seq, labels: prepareLabels({ template: 'bin', stock, items }) });
});
