import 'server-only';
import { Bin, Part, User } from '@/models';
import { variancePercent } from '@/lib/variance';
import { ROLE_PERMISSIONS } from '@/lib/roles';
import type { SessionUser } from '../../auth/session';
import { sendMail } from '../../mail/send-mail';
import type { BinCountResult } from './apply-bin-count';

// A count beyond the site limits is the clerk's escalation: the people who may approve it hear of it
// at once, with what they need to decide. Sent after the capture has committed.
export async function notifyPendingVariance(result: BinCountResult, by: SessionUser): Promise<void> {
  const bin = await Bin.findByPk(result.binId, { attributes: ['id', 'code', 'partId'] });
  const part = bin ? await Part.findByPk(bin.partId, { attributes: ['id', 'partNumber', 'description'] }) : null;
  if (!bin || !part) return;
  // Planners and quality decide variances day to day; administrators may, but are not mailed for stock.
  const approvers = await User.findAll({
    where: { role: [...ROLE_PERMISSIONS['variances.approve']].filter((r) => r !== 'admin'), active: true },
    attributes: ['email'],
  });
  const pct = variancePercent(result.variance, result.bookQuantity);
  const signed = `${result.variance > 0 ? '+' : ''}${result.variance} pcs${Number.isFinite(pct) ? `, ${(Math.round(pct * 10) / 10).toString()} %` : ''}`;
  await sendMail({
    kind: 'variance_pending',
    to: approvers.map((u) => u.email),
    subject: `Variance to decide: bin ${bin.code} counted ${result.counted}, book ${result.bookQuantity} (${signed})`,
    text: [
      `${by.name} counted bin ${bin.code} (${part.partNumber}, ${part.description}): ${result.counted} pieces against a book quantity of ${result.bookQuantity} (${signed}).`,
      'That is beyond the site limits, so the book stays as it is until someone decides.',
      '',
      'Approve it to book the counted quantity, or reject it to keep the book and have the bin counted again: Tallyforge → Variances.',
    ].join('\n'),
  });
}
