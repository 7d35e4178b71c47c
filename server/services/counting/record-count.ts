import 'server-only';
import { createHash } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { Container, CountEvent, Part, type Scale } from '@/models';
import { binCountFor } from '../bins/bin-count-for';
import { lineProgress } from '../orders/line-progress';
import { assessCount } from '@/lib/weighing';
import { toGrams } from '@/lib/weighing/units';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { log } from '../../log';
import { AppError } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import type { CountEventDto, RecordCountInput } from '@/lib/contracts/counts';
import { applyBinCount, type BinCountResult } from '../bins/apply-bin-count';
import { notifyPendingVariance } from '../bins/notify-pending-variance';
import { applyCountToLine, type LineProgress } from '../orders/apply-count-to-line';
import { partSpreadBelief } from '../parts/part-spread-belief';
import { loadUsableScale, scaleNoise, scaleWeighingAt } from '../scales/usable-scale';
import { getSettings } from '../settings/get-settings';
import { siteDay } from '@/lib/time/site-clock';
import { toCountEventDto } from './count-event-dto';
import { lockCountTarget } from './lock-count-target';

export interface CountAnswer {
  count: CountEventDto;
  line: LineProgress | null;
  binCount: BinCountResult | null;
  replayed: boolean;
}

export interface RecordCountOptions {
  idempotencyKey: string;
  input: RecordCountInput;
  by: SessionUser;
}

// Records one capture. The server never trusts a count it did not compute: it recomputes from the
// submitted weights with the scale's own profile. A retry with the same key returns the first answer.
export async function recordCount({ idempotencyKey, input, by }: RecordCountOptions): Promise<CountAnswer> {
  const db = getDb();
  const requestHash = createHash('sha256')
    .update(JSON.stringify({ input, operator: by.id }))
    .digest('hex');
  // Three reads that take no lock, side by side on their own connections: one round trip, not three.
  // The part is read outside the transaction as it would be inside it: unlocked, as of now.
  const [earlier, settings, part] = await Promise.all([CountEvent.findOne({ where: { idempotencyKey } }), getSettings(), Part.findByPk(input.partId)]);
  if (earlier) return replay(earlier, requestHash);
  const { defaultPieceSpread, varianceThresholdPcs, varianceThresholdPct, timeZone } = settings;
  const today = siteDay(timeZone);
  let answer: CountAnswer;
  try {
    answer = await retryOnDeadlock(() =>
      db.transaction(async (transaction) => {
        if (!part) throw new AppError('not_found', 'Part was not found', { fields: { partId: 'no such part' } });
        if (part.countingMethod === 'hand') throw new AppError('rule_violated', `${part.partNumber} is counted by hand, not by weight`);
        if ((input.purpose === 'kit_line') !== Boolean(input.orderLineId)) {
          throw new AppError('validation_failed', 'A kit-line capture names its order line, and only it does', {
            fields: { orderLineId: input.purpose === 'kit_line' ? 'required for kit_line' : 'only for kit_line' },
          });
        }
        if (input.binId && (input.purpose !== 'bin' || input.binVersion == null)) {
          throw new AppError('validation_failed', 'A bin count is purpose bin and names the bin version it started from', {
            fields: { binVersion: 'required with binId for purpose bin' },
          });
        }
        if (input.containerId && !(await Container.count({ where: { id: input.containerId }, transaction }))) {
          throw new AppError('not_found', 'Container was not found', { fields: { containerId: 'no such container' } });
        }
        const scale = await loadUsableScale(input.scaleId, transaction, today);
        const bulkScale = input.bulkScaleId ? await loadBulkScale(input, transaction, today) : null;
        const loadScale = bulkScale ?? scale;
        await lockCountTarget(input, transaction);
        const g = (v: number) => toGrams(v, input.unit);
        const noise = scaleNoise(loadScale);
        const gross = g(input.gross);
        const tare = acceptedTare(g(input.tare), noise.division);
        const net = gross - tare;
        const sampleNet = g(input.sample.netWeight);
        const capacity = Number(loadScale.capacityG);
        if (!input.stable) throw new AppError('unstable', 'The reading was still moving; wait until it settles and capture again');
        if (gross > capacity) throw new AppError('over_capacity', `The load is above the scale's capacity (${capacity} g); the reading cannot be used`);
        if (net <= 0) throw new AppError('validation_failed', 'Nothing to count', { fields: { gross: 'gross must be larger than tare' } });
        if (input.sampleOnPan && sampleNet > net + noise.division) {
          throw new AppError('validation_failed', 'Some fields need attention', {
            fields: { 'sample.netWeight': 'the sample cannot weigh more than the whole pan when it stays on it' },
          });
        }
        const sampleScale = bulkScale ? scaleWeighingAt(scale, sampleNet) : scaleNoise(scale);
        const { result, share } = assessCount(
          {
            unit: 'g',
            scale: { ...sampleScale, max: Number(scale.capacityG), min: Number(scale.minLoadG) },
            ...(bulkScale ? { bulkScale: { ...scaleWeighingAt(bulkScale, net), max: capacity, min: Number(bulkScale.minLoadG) } } : {}),
            sample: { quantity: input.sample.quantity, netWeight: sampleNet },
            netWeight: net,
            sampleOnPan: input.sampleOnPan,
            targetQuantity: input.targetQuantity ?? undefined,
            tare,
          },
          { defaultPieceSpread, spread: partSpreadBelief(part) },
        );
        const event = await CountEvent.create(
          {
            idempotencyKey,
            requestHash,
            purpose: input.purpose,
            partId: part.id,
            scaleId: scale.id,
            bulkScaleId: bulkScale?.id ?? null,
            containerId: input.containerId ?? null,
            grossG: String(gross),
            tareG: String(tare),
            netG: String(net),
            sampleQuantity: input.sample.quantity,
            sampleNetG: String(sampleNet),
            sampleOnPan: input.sampleOnPan,
            apwG: String(result.averagePieceWeight),
            pieceSpread: String(result.pieceSpread.value),
            countRaw: String(result.countRaw),
            count: result.count,
            standardUncertainty: String(result.standardUncertainty),
            expandedUncertainty: String(result.expandedUncertainty),
            exact: result.exact,
            probabilityExact: String(result.probabilityExact),
            wholePieceRange: result.wholePieceRange,
            uncertainPieces: String(Math.round(share.uncertainPieces * 1e4) / 1e4),
            apwRelativeVariance: share.apwRelativeVariance,
            targetQuantity: input.targetQuantity ?? null,
            warnings: result.warnings,
            operatorId: by.id,
            orderLineId: input.orderLineId ?? null,
            binId: input.binId ?? null,
          },
          { transaction },
        );
        const line = input.orderLineId ? await applyCountToLine({ orderLineId: input.orderLineId, partId: part.id, count: result.count }, transaction) : null;
        const binCount = input.binId
          ? await applyBinCount(
              {
                binId: input.binId,
                binVersion: input.binVersion!,
                partId: part.id,
                countEventId: event.id,
                counted: result.count,
                limits: { pieces: varianceThresholdPcs, percent: varianceThresholdPct },
                by: by.id,
              },
              transaction,
            )
          : null;
        return { count: toCountEventDto(event), line, binCount, replayed: false };
      }),
    );
  } catch (err) {
    // Two tries with one key raced past the first lookup: the loser answers with the winner's event.
    if (err instanceof UniqueConstraintError) {
      const winner = await CountEvent.findOne({ where: { idempotencyKey } });
      if (winner) return replay(winner, requestHash);
    }
    throw err;
  }
  // The count stands whatever happens to the notice; a failed one is in the log and the outbox.
  if (answer.binCount?.status === 'pending') await notifyPendingVariance(answer.binCount, by).catch((err) => log.error({ err }, 'variance notice failed'));
  return answer;
}

// The bulk's own scale: another scale than the sample's, usable, and the sample set apart.
async function loadBulkScale(input: RecordCountInput, transaction: Transaction, today: string): Promise<Scale> {
  if (input.bulkScaleId === input.scaleId) {
    throw new AppError('validation_failed', 'Some fields need attention', {
      fields: { bulkScaleId: "the bulk scale must be another scale than the sample's" },
    });
  }
  if (input.sampleOnPan) {
    throw new AppError('validation_failed', 'Some fields need attention', {
      fields: { sampleOnPan: 'with the bulk on another scale the sample is weighed apart: sampleOnPan must be false' },
    });
  }
  return loadUsableScale(input.bulkScaleId!, transaction, today);
}

// An empty pan tared a hair below zero (−0.0048 g on a 0.001 g scale) is zero: within one division
// the tare is rounding and drift, not a container. Further below zero the scale needs zeroing.
function acceptedTare(tare: number, division: number): number {
  if (tare >= 0) return tare;
  if (tare >= -division) return 0;
  throw new AppError('validation_failed', 'Some fields need attention', {
    fields: { tare: `The tare is ${Number((-tare).toPrecision(3))} g below zero, more than one division: empty the pan, zero the scale and tare again` },
  });
}

async function replay(event: CountEvent, requestHash: string): Promise<CountAnswer> {
  if (event.requestHash !== requestHash) {
    throw new AppError('conflict', 'This Idempotency-Key was already used for a different capture; send a new key for a new capture');
  }
  const line = event.orderLineId ? await lineProgress(event.orderLineId) : null;
  const binCount = event.binId ? await binCountFor(event.id) : null;
  return { count: toCountEventDto(event), line, binCount, replayed: true };
}
