// Reads what reached the local IPP printer fake, and follows print jobs through the API.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { inject } from 'vitest';
import type { PrintedJob } from '../../scripts/fakes/ipp-printer';
import type { Agent } from './http';
import './test-env';

export interface ReceivedJob extends PrintedJob {
  pdf: Buffer;
}

// For tests that call print services in the test process: send to this project's fake. Each project
// starts its own fake, so the address comes through inject(), not an environment variable set in setup.
export function sendToProjectPrinter(): void {
  process.env.PRINTER_URL = inject('printerUrl');
}

export function printedJobs(): ReceivedJob[] {
  const dir = inject('printDir');
  return readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => ({ ...(JSON.parse(readFileSync(path.join(dir, f), 'utf8')) as PrintedJob), pdf: readFileSync(path.join(dir, f.replace(/\.json$/, '.pdf'))) }));
}

export function printedJob(printerJobId: number): ReceivedJob | undefined {
  return printedJobs().find((j) => j.jobId === printerJobId);
}

// Polls the print log until no job of the batch is still queued (they are sent after the POST answers).
export async function waitForBatch(agent: Agent, batchId: string, timeoutMs = 20_000): Promise<Array<Record<string, unknown>>> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const res = await agent.get(`/api/v1/print-jobs?batch=${batchId}`);
    const jobs = res.body.jobs as Array<Record<string, unknown>>;
    if (jobs.every((j) => j.status !== 'queued') || Date.now() > until) return jobs;
    await new Promise((r) => setTimeout(r, 100));
  }
}
