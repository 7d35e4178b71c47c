/** What the outbox shows in place of a one-time link: the mail carries it, the log never does. */
export const HIDDEN_SECRET = '[one-time link: only the recipient has it]';

/** The text as it may be logged: every secret the mail carries replaced, wherever it appears. */
export function maskSecrets(text: string, secrets: readonly string[]): string {
  return secrets.filter((s) => s.length > 0).reduce((masked, secret) => masked.split(secret).join(HIDDEN_SECRET), text);
}
