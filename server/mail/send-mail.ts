import 'server-only';
import { MailMessage } from '@/models';
import type { MailStatus } from '@/models/mail-message';
import { getDb } from '../db';
import { getEnv } from '../env';
import { log } from '../log';
import { addressListForLog } from './address-list';
import { maskSecrets } from './mask-secrets';
import { getTransport } from './transport';

export interface OutgoingMail {
  kind: string;
  to: string[];
  subject: string;
  text: string;
  /** Parts of the text only the recipient may see (one-time links): masked in the outbox. */
  secrets?: string[];
}

// Logs the message (secrets masked), then sends it. Call after the business transaction commits: a mail
// failure is recorded on the log row and never undoes the change that caused it.
export async function sendMail(mail: OutgoingMail): Promise<MailStatus> {
  getDb();
  if (!mail.to.length) return 'sent';
  const row = await MailMessage.create({
    kind: mail.kind,
    toAddress: addressListForLog(mail.to),
    subject: mail.subject,
    bodyText: maskSecrets(mail.text, mail.secrets ?? []),
    status: 'queued',
    error: null,
    sentAt: null,
  });
  try {
    await getTransport().sendMail({ from: getEnv().MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text });
    await row.update({ status: 'sent', sentAt: new Date() });
    return 'sent';
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    await row.update({ status: 'failed', error: message.slice(0, 500) });
    log.warn({ kind: mail.kind, err: message }, 'mail send failed');
    return 'failed';
  }
}
