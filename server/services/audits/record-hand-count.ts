import 'server-only';
import { Audit, AuditItem, CountEvent, User } from '@/models';
import { judgeAuditItem, judgeLot } from '@/lib/sampling/judge-audit';
import { wholePieceRangeOf } from '../counting/count-event-dto';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { sendMail } from '../../mail/send-mail';
import type { AuditDto } from '@/lib/contracts/audits';
import { getAudit } from './get-audit';

// Keys in one recount. When the last item is in, the lot is judged (ISO 2859-1 Ac/Re);
// a rejected lot is mailed to quality and planners after the commit.
export async function recordHandCount({
  auditId,
  itemId,
  handCount,
  by,
}: {
  auditId: number;
  itemId: number;
  handCount: number;
  by: SessionUser;
}): Promise<AuditDto> {
  const db = getDb();
  const closed = await db.transaction(async (transaction) => {
    const audit = await Audit.findByPk(auditId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!audit) throw notFound('Audit');
    if (audit.status === 'closed') throw new AppError('rule_violated', 'This audit is closed; its recounts can no longer change');
    const item = await AuditItem.findOne({ where: { id: itemId, auditId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!item) throw notFound('Audit item');
    item.set({ handCount, countedBy: by.id, countedAt: new Date() });
    await item.save({ transaction });
    const items = await AuditItem.findAll({ where: { auditId }, include: [{ model: CountEvent, as: 'event' }], transaction });
    if (items.some((i) => i.handCount === null)) return null;
    const defects = items.filter((i) => {
      const e = (i as AuditItem & { event: CountEvent }).event;
      return !judgeAuditItem({ count: e.count, wholePieceRange: wholePieceRangeOf(e), exact: e.exact, handCount: i.handCount! }).withinUncertainty;
    }).length;
    audit.set({ status: 'closed', defects, verdict: judgeLot(defects, audit.accept), closedAt: new Date() });
    await audit.save({ transaction });
    return audit;
  });
  if (closed?.verdict === 'rejected') {
    const people = await User.findAll({ where: { role: ['quality', 'planner'], active: true }, attributes: ['email'] });
    await sendMail({
      kind: 'audit_rejected',
      to: people.map((p) => p.email),
      subject: `Count audit ${closed.id} rejected: ${closed.defects} of ${closed.sampleSize} recounts outside their stated uncertainty`,
      text: `Audit ${closed.id} (lot of ${closed.lotSize} counts, code letter ${closed.codeLetter}, AQL ${Number(closed.aql)}) found ${closed.defects} nonconforming counts; the plan accepts at most ${closed.accept}.\nReview the audit in Tallyforge: which parts, scales and operators were involved, and whether the scales need a test.`,
    });
  }
  return getAudit({ auditId });
}
