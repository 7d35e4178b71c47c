// Reads what reached the local SMTP sink.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { inject } from 'vitest';
import type { SunkMail } from '../../scripts/fakes/smtp-sink';
import './test-env';

export function mailTo(address: string): SunkMail[] {
  const dir = inject('mailDir');
  return readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), 'utf8')) as SunkMail)
    .filter((m) => m.to.includes(address));
}

export async function waitForMail(address: string, count = 1, timeoutMs = 5000): Promise<SunkMail[]> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = mailTo(address);
    if (found.length >= count || Date.now() > until) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
}
