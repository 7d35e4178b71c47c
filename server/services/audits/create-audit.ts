import 'server-only';
import { randomInt } from 'node:crypto';
import { Audit, AuditItem, CountEvent } from '@/models';
import { samplingPlan } from '@/lib/sampling/iso2859';
import { selectSample } from '@/lib/sampling/select-sample';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { AuditDto, CreateAuditInput } from '@/lib/contracts/audits';
import { countEventWhere } from '../counting/count-event-filter';
import { siteTimeZone } from '../settings/get-settings';
import { getAudit } from './get-audit';

// The lot is every capture in the population; the sample is drawn with a recorded seed.
export async function createAudit({ input, by }: { input: CreateAuditInput; by: SessionUser }): Promise<AuditDto> {
  const db = getDb();
  const events = await CountEvent.findAll({
    where: countEventWhere(input.population, await siteTimeZone()),
    attributes: ['id'],
    order: [['id', 'ASC']],
    raw: true,
  });
  if (events.length < 2)
    throw new AppError('rule_violated', `The population holds ${events.length} count(s); an audit needs at least 2`, {
      fields: { population: 'too few counts' },
    });
  const plan = samplingPlan(events.length, input.aql, input.level);
  const seed = input.seed ?? randomInt(1, 2 ** 31 - 1);
  const chosen = selectSample(
    events.map((e) => e.id),
    plan.sampleSize,
    seed,
  );
  const id = await db.transaction(async (transaction) => {
    const audit = await Audit.create(
      {
        population: input.population,
        lotSize: events.length,
        level: input.level,
        aql: String(input.aql),
        codeLetter: plan.codeLetter,
        sampleSize: chosen.length,
        accept: plan.accept,
        reject: plan.reject,
        seed,
        defects: null,
        verdict: null,
        createdBy: by.id,
        closedAt: null,
      },
      { transaction },
    );
    await AuditItem.bulkCreate(
      chosen.map((countEventId) => ({ auditId: audit.id, countEventId, handCount: null, countedBy: null, countedAt: null })),
      { transaction },
    );
    return audit.id;
  });
  return getAudit({ auditId: id });
}
