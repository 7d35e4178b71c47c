import 'server-only';
import { Bin, Part, User } from '@/models';
import type { SessionUser } from '../../auth/session';
import { sendMail } from '../../mail/send-mail';

// A rejected variance means the bin must be counted again: the clerks hear of it, with the reason.
// Sent after the decision has committed; a failed mail is in the outbox and the log.
export async function notifyRejectedVariance(
  decided: { binId: number; counted: number; bookQuantity: number; note: string | null },
  by: SessionUser,
): Promise<void> {
  const bin = await Bin.findByPk(decided.binId, { attributes: ['id', 'code', 'partId'] });
  const part = bin ? await Part.findByPk(bin.partId, { attributes: ['id', 'partNumber', 'description'] }) : null;
  if (!bin || !part) return;
  const clerks = await User.findAll({ where: { role: 'clerk', active: true }, attributes: ['email'] });
  if (clerks.length === 0) return;
  await sendMail({
    kind: 'variance_rejected',
    to: clerks.map((u) => u.email),
    subject: `Count bin ${bin.code} again: its count of ${decided.counted} was rejected`,
    text: [
      `${by.name} rejected the count of bin ${bin.code} (${part.partNumber}, ${part.description}): ${decided.counted} pieces against a book quantity of ${decided.bookQuantity}.`,
      decided.note ? `Their note: ${decided.note}` : 'They left no note.',
      '',
      'The book stays as it was, and the bin is first on the cycle-count plan again: Tallyforge → Bins.',
    ].join('\n'),
  });
}
