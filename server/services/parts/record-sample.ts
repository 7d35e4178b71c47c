import 'server-only';
import { Part, PieceWeightSample } from '@/models';
import { historyOutlier, planningSpread, sampleProblems, spreadEstimate, spreadNodes, netVarianceBound, ASSUMED_PIECE_SPREAD } from '@/lib/weighing';
import { toGrams } from '@/lib/weighing/units';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { PartDto, RecordSampleInput, SampleDto } from '@/lib/contracts/parts';
import { loadUsableScale, scaleNoise } from '../scales/usable-scale';
import { siteDay } from '@/lib/time/site-clock';
import { siteTimeZone } from '../settings/get-settings';
import { partSpreadBelief } from './part-spread-belief';
import { relearnPart } from './relearn-part';
import { toPartDto, toSampleDto } from './part-dto';

export interface RecordSampleOptions {
  partId: number;
  input: RecordSampleInput;
  by: SessionUser;
}

// How far back the history test looks (our choice, the same window the spread learns from).
const HISTORY = 50;

// Keeps the sample in the part's history and, unless it is held, updates the learned APW and
// spread, all in one transaction. A sample the scale cannot have weighed is refused (422); one
// far from the part's history is kept but held for review and changes nothing about the part.
export async function recordSample({ partId, input, by }: RecordSampleOptions): Promise<{ sample: SampleDto; part: PartDto; held: boolean }> {
  const db = getDb();
  const today = siteDay(await siteTimeZone());
  return db.transaction(async (transaction) => {
    const part = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!part) throw notFound('Part');
    if (part.countingMethod === 'hand') throw new AppError('rule_violated', `${part.partNumber} is counted by hand, not by weight`);
    const scale = await loadUsableScale(input.scaleId, transaction, today);
    const noise = scaleNoise(scale);
    const net = toGrams(input.netWeight, input.unit);
    const problems = sampleProblems(
      { quantity: input.quantity, netWeight: net },
      { division: noise.division, max: Number(scale.capacityG), min: Number(scale.minLoadG) },
    );
    if (problems.length > 0) {
      throw new AppError('rule_violated', 'This sample cannot be right on this scale', {
        fields: Object.fromEntries(problems.map((p) => [p.field, p.message])),
      });
    }
    const increments = input.increments?.map((x) => toGrams(x, input.unit)) ?? null;
    if (increments) checkIncrements(increments, input.quantity, net, noise.division);
    const apw = net / input.quantity;
    const belief = partSpreadBelief(part);
    const netVariance = netVarianceBound(noise, apw * Math.sqrt(input.quantity) * (belief ? spreadEstimate(belief) : ASSUMED_PIECE_SPREAD));
    const history = await PieceWeightSample.findAll({ where: { partId, status: 'accepted' }, order: [['id', 'DESC']], limit: HISTORY, transaction });
    const outlier = historyOutlier({
      quantity: input.quantity,
      averagePieceWeight: apw,
      netVariance,
      history: history.map((s) => ({ quantity: s.quantity, averagePieceWeight: Number(s.apwG) })),
      c2: planningSpread(spreadNodes(belief ?? { kind: 'assumed', pieceSpread: ASSUMED_PIECE_SPREAD })),
    });
    const holdReason = outlier.held
      ? `APW ${Number(apw.toPrecision(6))} g is ${outlier.sigmas.toFixed(1)} standard deviations from this part's history (${Number(outlier.historyMean!.toPrecision(6))} g)`
      : null;
    const sample = await PieceWeightSample.create(
      {
        partId,
        scaleId: scale.id,
        quantity: input.quantity,
        netWeightG: String(net),
        apwG: String(apw),
        incrementsG: increments,
        createdBy: by.id,
        status: outlier.held ? 'held' : 'accepted',
        holdReason,
        netVarianceG2: netVariance,
      },
      { transaction },
    );
    if (!outlier.held) await relearnPart(part, transaction);
    return { sample: toSampleDto(sample), part: toPartDto(part), held: outlier.held };
  });
}

// A sample built piece by piece has one increment per piece, and they add up to the net weight
// (each increment is a difference of rounded readings, so the sum telescopes to within a few d).
function checkIncrements(increments: number[], quantity: number, net: number, division: number): void {
  if (increments.length !== quantity) {
    throw new AppError('validation_failed', 'Some fields need attention', {
      fields: { increments: `expected ${quantity} increments, one per piece, got ${increments.length}` },
    });
  }
  const sum = increments.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - net) > 3 * division + 1e-9) {
    throw new AppError('validation_failed', 'Some fields need attention', { fields: { increments: 'the increments do not add up to the sample net weight' } });
  }
}
