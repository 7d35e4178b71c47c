import { describe, expect, it } from 'vitest';
import { createCaptureQueue, type KeyValueStore, type QueuedCapture, type SendOutcome } from './capture-queue';

function memoryStore(): KeyValueStore {
  const map = new Map<string, string>();
  return { getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v) };
}

const item = (key: string): QueuedCapture => ({
  key,
  label: 'SC-4',
  queuedAt: '2024-01-01T00:00:00Z',
  body: { purpose: 'part', partId: 1, scaleId: 1, unit: 'g', gross: 10, tare: 0, sample: { quantity: 1, netWeight: 1 }, sampleOnPan: true, stable: true },
});

describe('capture queue', () => {
  it('keeps a capture once however often it is queued', () => {
    const q = createCaptureQueue(memoryStore());
    q.add(item('a'));
    q.add(item('a'));
    expect(q.list()).toHaveLength(1);
  });

  it('sends in order and keeps what could not reach the server', async () => {
    const q = createCaptureQueue(memoryStore());
    q.add(item('a'));
    q.add(item('b'));
    const sent: string[] = [];
    await q.flush(async (i) => {
      sent.push(i.key);
      return i.key === 'a' ? { kind: 'sent' } : { kind: 'offline' };
    });
    expect(sent).toEqual(['a', 'b']);
    expect(q.list().map((i) => i.key)).toEqual(['b']);
  });

  it('sends each capture once when two flushes overlap', async () => {
    const q = createCaptureQueue(memoryStore());
    q.add(item('a'));
    let calls = 0;
    const send = async (): Promise<SendOutcome> => {
      calls += 1;
      await new Promise((r) => setTimeout(r, 5));
      return { kind: 'sent' };
    };
    await Promise.all([q.flush(send), q.flush(send)]);
    expect(calls).toBe(1);
    expect(q.list()).toEqual([]);
  });

  it('holds a refused capture with the reason and goes on with the next', async () => {
    const q = createCaptureQueue(memoryStore());
    q.add(item('a'));
    q.add(item('b'));
    await q.flush(async (i) => (i.key === 'a' ? { kind: 'refused', message: 'scale locked' } : { kind: 'sent' }));
    expect(q.list()).toEqual([{ ...item('a'), error: 'scale locked' }]);
  });
});
