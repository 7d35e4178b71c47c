import type { QueryInterface } from 'sequelize';

// One-time links were logged in full before the outbox masked them: mask the ones already there.
// The text is written out here (not imported) so this migration stays as it shipped.
const HIDDEN = '[one-time link: only the recipient has it]';

export async function up({ context: q }: { context: QueryInterface }): Promise<void> {
  await q.sequelize.query(
    `UPDATE mail_messages SET body_text = REGEXP_REPLACE(body_text, 'https?://[^[:space:]]*/set-password\\\\?token=[A-Za-z0-9_-]+', ${q.sequelize.escape(HIDDEN)}) WHERE body_text LIKE '%set-password?token=%'`,
  );
}

// The links cannot be brought back, and should not be.
export async function down(): Promise<void> {}
