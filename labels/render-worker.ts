// Runs in a worker thread (server/labels/label-pool.ts): barcode encoding and PDF assembly take whole
// seconds for a large batch, and on the main thread they would stall every other request meanwhile.
import { KitLabelDataError } from './kit-element-strings';
import { LabelFitError } from './label-content';
import { renderLabels, type LabelBatch } from './render-labels';

export type RenderOutcome = { ok: true; pdf: Uint8Array; pages: number; unprintable: string[] } | { ok: false; unfit: string };

// Errors lose their class on the way back from a worker: data that cannot go on the stock comes back as an outcome.
export default async function render(batch: LabelBatch & { title: string }): Promise<RenderOutcome> {
  try {
    return { ok: true, ...(await renderLabels(batch)) };
  } catch (err) {
    if (err instanceof LabelFitError || err instanceof KitLabelDataError) return { ok: false, unfit: err.message };
    throw err;
  }
}
