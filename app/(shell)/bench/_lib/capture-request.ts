/** The body of POST /api/v1/counts for the work on the pan: weights only, the server counts. */
import { sampleOnPan, type BenchWork } from './bench-work';

export interface CaptureBody {
  purpose: BenchWork['purpose'];
  partId: number;
  scaleId: number;
  bulkScaleId?: number;
  containerId?: number;
  unit: 'g';
  gross: number;
  tare: number;
  sample: { quantity: number; netWeight: number };
  sampleOnPan: boolean;
  targetQuantity?: number;
  orderLineId?: number;
  binId?: number;
  binVersion?: number;
  stable: true;
}

/** Weights to 6 decimals, the database's precision for grams. */
const g6 = (x: number): number => Number(x.toFixed(6));

export function buildCaptureBody(work: BenchWork, stableMean: number): CaptureBody {
  if (!work.sample) throw new Error('buildCaptureBody: no sample yet');
  const body: CaptureBody = {
    purpose: work.purpose,
    partId: work.partId,
    scaleId: work.scaleId,
    unit: 'g',
    gross: g6(stableMean),
    tare: g6(work.tare ?? work.panZero ?? 0),
    sample: { quantity: work.sample.quantity, netWeight: g6(work.sample.netWeight) },
    sampleOnPan: sampleOnPan(work),
    stable: true,
  };
  // Sample on one scale, bulk on another: the server counts each weighing with its own scale's noise.
  if (work.bulkScaleId != null) body.bulkScaleId = work.bulkScaleId;
  if (work.containerId != null) body.containerId = work.containerId;
  if (work.targetQuantity != null) body.targetQuantity = work.targetQuantity;
  if (work.orderLineId != null) body.orderLineId = work.orderLineId;
  if (work.binId != null && work.binVersion != null) Object.assign(body, { binId: work.binId, binVersion: work.binVersion });
  return body;
}
