'use client';

// localStorage that never throws (private mode, full quota): the bench keeps working, only unsaved.
export const browserStore = {
  getItem(key: string): string | null {
    try {
      return window.localStorage.getItem(key);
    } catch {
      return null;
    }
  },
  setItem(key: string, value: string): void {
    try {
      window.localStorage.setItem(key, value);
    } catch {
      // nothing to do: the state lives on in memory
    }
  },
  removeItem(key: string): void {
    try {
      window.localStorage.removeItem(key);
    } catch {
      // as above
    }
  },
};

/** A random capture key; crypto.randomUUID needs a secure context, getRandomValues does not. */
export function newCaptureKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
}
