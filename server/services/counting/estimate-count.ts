import 'server-only';
import { estimateCount, type EstimateCountResult } from '@/lib/weighing';
import type { EstimateInput } from '@/lib/contracts/estimate';
import { getSettings } from '../settings/get-settings';

// The server-checked preview: the same pure function the bench runs, with the site's default spread.
export async function previewCount({ input }: { input: EstimateInput }): Promise<EstimateCountResult> {
  const { defaultPieceSpread } = await getSettings();
  return estimateCount(input, { defaultPieceSpread });
}
