'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import { useEffect, useState } from 'react';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { apiFetch } from '../../_components/api-client';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { useSiteTime } from '../../_components/site-time';

const STATUS_TEXT: Record<PrintJobDto['status'], string> = { queued: 'Queued', sent: 'Sent', failed: 'Failed' };
const STATUS_CLASS: Record<PrintJobDto['status'], string> = { queued: 'text-caution', sent: 'text-ok', failed: 'text-fault font-bold' };

// The queue name is the last part of the printer's address; a reprint goes to the same queue.
const queueOf = (printerUrl: string) => printerUrl.split('/').filter(Boolean).pop();

function merge(list: PrintJobDto[], fresh: PrintJobDto[]): PrintJobDto[] {
  const byId = new Map(list.map((j) => [j.id, j]));
  for (const j of fresh) byId.set(j.id, j);
  return [...byId.values()].sort((a, b) => b.id - a.id);
}

// The print log, newest first. A batch just sent is followed until every job in it is sent or failed.
export function PrintLog({ initial, followBatch }: { initial: PrintJobDto[]; followBatch: string | null }) {
  const [jobs, setJobs] = useState(initial);
  const [following, setFollowing] = useState<string | null>(followBatch);
  const [note, setNote] = useState<string | null>(null);

  useEffect(() => setFollowing(followBatch), [followBatch]);

  useEffect(() => {
    if (!following) return;
    let polls = 0;
    let timer: ReturnType<typeof setTimeout>;
    const poll = async () => {
      const res = await apiFetch<{ jobs: PrintJobDto[] }>(`/api/v1/print-jobs?batch=${following}`);
      if (res.ok) {
        setJobs((list) => merge(list, res.data.jobs));
        if (res.data.jobs.every((j) => j.status !== 'queued')) return setFollowing(null);
      }
      if (++polls < 120) timer = setTimeout(poll, 1000);
    };
    void poll();
    return () => clearTimeout(timer);
  }, [following]);

  async function reprint(job: PrintJobDto) {
    setNote(null);
    const res = await apiFetch<{ batchId: string; jobs: PrintJobDto[] }>('/api/v1/print-jobs', {
      method: 'POST',
      body: { template: job.template, stock: job.stock, ids: job.ids, printer: queueOf(job.printer) },
    });
    if (!res.ok) return setNote(res.message);
    setJobs((list) => merge(list, res.data.jobs));
    setFollowing(res.data.batchId);
    setNote(`Job ${job.id} sent again as job ${res.data.jobs[0].id}.`);
  }

  const { when } = useSiteTime();
  const columns: ColDef<PrintJobDto>[] = [
    { field: 'id', headerName: 'Job', maxWidth: 100, cellClass: 'num' },
    { field: 'createdAt', headerName: 'Asked for', minWidth: 170, valueFormatter: (p) => when(p.value) },
    { field: 'template', headerName: 'Labels', minWidth: 140, valueGetter: (p) => `${p.data?.labels} ${p.data?.template}` },
    { field: 'stock', headerName: 'Stock', maxWidth: 120 },
    { field: 'printer', headerName: 'Printer', minWidth: 160, valueFormatter: (p) => queueOf(p.value) ?? p.value },
    {
      field: 'status',
      headerName: 'Status',
      minWidth: 220,
      flex: 2,
      cellRenderer: (p: ICellRendererParams<PrintJobDto>) =>
        p.data ? (
          <span>
            <span className={STATUS_CLASS[p.data.status]}>{STATUS_TEXT[p.data.status]}</span>
            {p.data.batchCount > 1 ? (
              <span className="text-ink-faint">
                {' '}
                · part {p.data.batchIndex + 1} of {p.data.batchCount}
              </span>
            ) : null}
            {p.data.error ? <span className="text-ink-soft"> · {p.data.error}</span> : null}
            {p.data.note ? <span className="text-caution"> · {p.data.note}</span> : null}
          </span>
        ) : null,
    },
    {
      headerName: '',
      sortable: false,
      filter: false,
      maxWidth: 140,
      cellRenderer: (p: ICellRendererParams<PrintJobDto>) =>
        p.data && p.data.status === 'failed' ? (
          <button type="button" className="text-forge hover:underline" onClick={() => reprint(p.data!)} aria-label={`Print job ${p.data.id} again`}>
            Print again
          </button>
        ) : null,
    },
  ];

  return (
    <section className="space-y-3" aria-labelledby="print-log-title">
      <h2 id="print-log-title" className="text-lg font-bold">
        Print log
      </h2>
      <p role="status" aria-live="polite" className="min-h-5 text-sm text-ink-soft" data-testid="print-log-status">
        {note ?? (following ? 'Sending to the printer…' : `${jobs.length} recent job${jobs.length === 1 ? '' : 's'}.`)}
      </p>
      <DataGrid<PrintJobDto>
        label="Print log"
        emptyText="No labels printed yet."
        rows={jobs}
        columns={columns}
        rowId={(j) => String(j.id)}
        height={fitHeight(jobs.length, 420)}
      />
    </section>
  );
}
