import 'server-only';
import os from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import type { LabelBatch } from '@/labels/render-labels';
import type { RenderOutcome } from '@/labels/render-worker';
import { getEnv } from '../env';
import { AppError } from '../errors';

// Label rendering in worker threads with a bounded queue (piscina). One thread fewer than the cores
// (at least one), so requests keep a core; past the queue's length (LABEL_QUEUE_LIMIT) a render is
// refused with 503 rather than left to pile up in memory.

let pool: Piscina | undefined;

function labelPool(): Piscina {
  pool ??= new Piscina({
    // The worker is TypeScript, loaded through tsx (as scripts/serve.ts is), whatever started this process.
    filename: path.join(process.cwd(), 'labels/render-worker.ts'),
    execArgv: ['--import', 'tsx'],
    // One worker stays up once the first label is drawn: starting one (and tsx in it) takes about a second.
    minThreads: 1,
    maxThreads: Math.max(1, os.availableParallelism() - 1),
    idleTimeout: 60_000,
  });
  return pool;
}

export async function renderInPool(batch: LabelBatch & { title: string }): Promise<RenderOutcome> {
  const p = labelPool();
  if (p.queueSize >= getEnv().LABEL_QUEUE_LIMIT) {
    throw new AppError('unavailable', 'The label printer queue on the server is full; try again in a moment', { headers: { 'Retry-After': '5' } });
  }
  return (await p.run(batch)) as RenderOutcome;
}
