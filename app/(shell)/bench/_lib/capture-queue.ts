/**
 * Captures that could not reach the server wait here (saved in the browser) and are sent again,
 * in order, with the key they were made with, so the server records each one once.
 */
import type { CaptureBody } from './capture-request';

export interface QueuedCapture {
  key: string;
  body: CaptureBody;
  label: string;
  queuedAt: string;
  /** Last refusal from the server, kept so the operator sees why it stopped. */
  error?: string;
}

export type SendOutcome = { kind: 'sent' } | { kind: 'offline' } | { kind: 'refused'; message: string };

export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

export const QUEUE_STORAGE_KEY = 'tallyforge.bench.queue';

export interface CaptureQueue {
  list(): QueuedCapture[];
  add(item: QueuedCapture): void;
  /** Sends the waiting captures in order; stops at the first that cannot reach the server. */
  flush(send: (item: QueuedCapture) => Promise<SendOutcome>): Promise<void>;
  remove(key: string): void;
}

function read(store: KeyValueStore): QueuedCapture[] {
  try {
    const parsed = JSON.parse(store.getItem(QUEUE_STORAGE_KEY) ?? '[]') as unknown;
    return Array.isArray(parsed) ? parsed.filter((q): q is QueuedCapture => typeof q?.key === 'string' && typeof q?.body === 'object') : [];
  } catch {
    return [];
  }
}

export function createCaptureQueue(store: KeyValueStore): CaptureQueue {
  const write = (items: QueuedCapture[]): void => store.setItem(QUEUE_STORAGE_KEY, JSON.stringify(items));
  let flushing: Promise<void> | null = null;

  const flushOnce = async (send: (item: QueuedCapture) => Promise<SendOutcome>): Promise<void> => {
    for (const item of read(store)) {
      if (item.error) continue; // refused: waits for the operator, not for the network
      const outcome = await send(item);
      if (outcome.kind === 'offline') return;
      const rest = read(store);
      write(outcome.kind === 'sent' ? rest.filter((q) => q.key !== item.key) : rest.map((q) => (q.key === item.key ? { ...q, error: outcome.message } : q)));
    }
  };

  return {
    list: () => read(store),
    add(item) {
      const items = read(store);
      if (!items.some((q) => q.key === item.key)) write([...items, item]);
    },
    remove(key) {
      write(read(store).filter((q) => q.key !== key));
    },
    // One flush at a time: an 'online' event and a button press together must not send twice.
    flush(send) {
      flushing ??= flushOnce(send).finally(() => {
        flushing = null;
      });
      return flushing;
    },
  };
}
