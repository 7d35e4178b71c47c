import 'server-only';
import { MailMessage } from '@/models';
import { getDb } from '../../db';

export interface MailDto {
  id: number;
  kind: string;
  to: string;
  subject: string;
  text: string;
  status: string;
  error: string | null;
  createdAt: string;
  sentAt: string | null;
}

export async function listMail({ limit = 200 }: { limit?: number } = {}): Promise<MailDto[]> {
  getDb();
  const rows = await MailMessage.findAll({ order: [['id', 'DESC']], limit });
  return rows.map((m) => ({
    id: m.id,
    kind: m.kind,
    to: m.toAddress,
    subject: m.subject,
    text: m.bodyText,
    status: m.status,
    error: m.error,
    createdAt: m.createdAt.toISOString(),
    sentAt: m.sentAt ? m.sentAt.toISOString() : null,
  }));
}
