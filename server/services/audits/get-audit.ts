import 'server-only';
import { Audit } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { AuditDto } from '@/lib/contracts/audits';
import { AUDIT_INCLUDE, toAuditDto } from './audit-dto';

export async function getAudit({ auditId }: { auditId: number }): Promise<AuditDto> {
  getDb();
  const audit = await Audit.findByPk(auditId, { include: AUDIT_INCLUDE });
  if (!audit) throw notFound('Audit');
  return toAuditDto(audit);
}

export async function listAudits(): Promise<Array<Omit<AuditDto, 'items'> & { counted: number }>> {
  getDb();
  const audits = await Audit.findAll({ include: [{ association: 'items', attributes: ['id', 'handCount'] }], order: [['id', 'DESC']], limit: 200 });
  return audits.map((a) => {
    const items = (a as Audit & { items?: Array<{ handCount: number | null }> }).items ?? [];
    const { items: _omit, ...rest } = toAuditDto(Object.assign(a, { items: [] }));
    return { ...rest, counted: items.filter((i) => i.handCount !== null).length };
  });
}
