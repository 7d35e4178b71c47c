import { after } from 'next/server';
import { route } from '@/server/http/route';
import { listPrintJobsSchema, printJobRequestSchema } from '@/lib/contracts/labels';
import { listPrintJobs } from '@/server/services/print-jobs/list-print-jobs';
import { queuePrintJobs } from '@/server/services/print-jobs/queue-print-jobs';
import { sendPrintJobs } from '@/server/services/print-jobs/send-print-jobs';

export const GET = route({ access: 'labels.print', query: listPrintJobsSchema }, async ({ query }) => ({ jobs: await listPrintJobs(query) }));

// Answers at once with the queued jobs (202); they are rendered and sent after the response, and
// GET ?batch=<batchId> follows them from queued to sent or failed.
export const POST = route({ access: 'labels.print', body: printJobRequestSchema }, async ({ body, user }) => {
  const queued = await queuePrintJobs({ ...body, by: user });
  after(() => sendPrintJobs({ jobIds: queued.jobs.map((j) => j.id) }));
  return Response.json(queued, { status: 202 });
});
