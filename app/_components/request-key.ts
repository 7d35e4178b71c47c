'use client';

import { useRef } from 'react';

/** A random Idempotency-Key; crypto.randomUUID needs a secure context (a tablet on plain http has none), getRandomValues does not. */
export function newRequestKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
}

/**
 * One Idempotency-Key per thing a form creates: sending the same values again (a retry after a lost
 * answer, a second press) reuses the key, so the server makes one record; other values get a new key,
 * and so does the next record after `done()`.
 */
export function useRequestKey(): { keyFor: (body: unknown) => string; done: () => void } {
  const last = useRef<{ body: string; key: string } | null>(null);
  return {
    keyFor: (body) => {
      const text = JSON.stringify(body);
      if (last.current?.body !== text) last.current = { body: text, key: newRequestKey() };
      return last.current.key;
    },
    done: () => {
      last.current = null;
    },
  };
}
