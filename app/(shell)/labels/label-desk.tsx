'use client';

import type { ColDef } from 'ag-grid-community';
import { useMemo, useState } from 'react';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { describeUnprintable, fromCodePointList, UNPRINTABLE_HEADER } from '@/lib/unprintable';
import { apiFetch } from '../../_components/api-client';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { PrintLog } from './print-log';

type Template = 'bin' | 'part' | 'kit';
interface BinRow {
  id: number;
  code: string;
  partNumber: string;
  bookQuantity: number;
}
interface PartRow {
  id: number;
  partNumber: string;
  description: string;
}
interface OrderRow {
  id: number;
  number: string;
  kit: string;
  quantity: number;
  status: string;
}
interface StockChoice {
  id: string;
  name: string;
  kit: boolean;
}

interface Props {
  bins: BinRow[];
  parts: PartRow[];
  orders: OrderRow[];
  stocks: StockChoice[];
  jobs: PrintJobDto[];
}

const TEMPLATES: { id: Template; label: string; hint: string }[] = [
  { id: 'bin', label: 'Bin labels', hint: 'Bin code and part in Code 128 and QR, for shelf faces and totes.' },
  { id: 'part', label: 'Part labels', hint: 'Part number in Code 128, for bags and drawers.' },
  { id: 'kit', label: 'Kit labels', hint: 'GS1-128 and GS1 DataMatrix with the order, kit and quantity, for finished kits (4 in wide stock).' },
];

// Picks what to label, then renders on the server: a PDF to download, or a batch for the printer.
export function LabelDesk({ bins, parts, orders, stocks, jobs }: Props) {
  const [template, setTemplate] = useState<Template>('bin');
  const [chosen, setChosen] = useState<number[]>([]);
  const [find, setFind] = useState('');
  const [stock, setStock] = useState('4x2in');
  const [printer, setPrinter] = useState('');
  const [busy, setBusy] = useState<'pdf' | 'print' | null>(null);
  const [message, setMessage] = useState<{ tone: 'ok' | 'caution' | 'fault'; text: string } | null>(null);
  const [batch, setBatch] = useState<string | null>(null);

  // Kit labels offer only the wide stocks; a narrow choice made for bins falls back to the first wide one.
  const usable = stocks.filter((s) => template !== 'kit' || s.kit);
  const chosenStock = usable.some((s) => s.id === stock) ? stock : usable[0].id;

  const grid = useMemo(() => {
    if (template === 'bin') {
      const columns: ColDef<BinRow>[] = [
        { field: 'code', headerName: 'Bin', cellClass: 'num', minWidth: 140 },
        { field: 'partNumber', headerName: 'Part', cellClass: 'num', flex: 2 },
        { field: 'bookQuantity', headerName: 'Book qty', cellClass: 'num', maxWidth: 140 },
      ];
      return (
        <DataGrid<BinRow>
          key="bin"
          label="Bins to label"
          rows={bins}
          columns={columns}
          rowId={(r) => String(r.id)}
          quickFilter={find}
          height={fitHeight(bins.length, 420)}
          onSelection={(rows) => setChosen(rows.map((r) => r.id))}
        />
      );
    }
    if (template === 'part') {
      const columns: ColDef<PartRow>[] = [
        { field: 'partNumber', headerName: 'Part number', cellClass: 'num', minWidth: 170 },
        { field: 'description', headerName: 'Description', flex: 2 },
      ];
      return (
        <DataGrid<PartRow>
          key="part"
          label="Parts to label"
          rows={parts}
          columns={columns}
          rowId={(r) => String(r.id)}
          quickFilter={find}
          height={fitHeight(parts.length, 420)}
          onSelection={(rows) => setChosen(rows.map((r) => r.id))}
        />
      );
    }
    const columns: ColDef<OrderRow>[] = [
      { field: 'number', headerName: 'Build order', cellClass: 'num', minWidth: 160 },
      { field: 'kit', headerName: 'Kit', flex: 2 },
      { field: 'quantity', headerName: 'Kits', cellClass: 'num', maxWidth: 120 },
      { field: 'status', headerName: 'Status', maxWidth: 150, valueFormatter: (p) => String(p.value).replace('_', ' ') },
    ];
    return (
      <DataGrid<OrderRow>
        key="kit"
        label="Build orders to label"
        rows={orders}
        columns={columns}
        rowId={(r) => String(r.id)}
        quickFilter={find}
        height={fitHeight(orders.length, 420)}
        onSelection={(rows) => setChosen(rows.map((r) => r.id))}
      />
    );
  }, [template, bins, parts, orders, find]);

  const labels = { template, stock: chosenStock, ids: chosen };
  const what = `${chosen.length} ${template} label${chosen.length === 1 ? '' : 's'}`;

  async function downloadPdf() {
    setBusy('pdf');
    setMessage(null);
    try {
      const res = await fetch('/api/v1/labels', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(labels),
        credentials: 'same-origin',
      });
      if (!res.ok) {
        const err = (await res.json().catch(() => null)) as { error?: { message?: string; fields?: Record<string, string> } } | null;
        setMessage({
          tone: 'fault',
          text: [err?.error?.message ?? `The server answered ${res.status}`, ...Object.values(err?.error?.fields ?? {})].join(': '),
        });
        return;
      }
      const url = URL.createObjectURL(await res.blob());
      const link = document.createElement('a');
      link.href = url;
      link.download = /filename="([^"]+)"/.exec(res.headers.get('Content-Disposition') ?? '')?.[1] ?? `${template}-labels.pdf`;
      link.click();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
      const unprintable = fromCodePointList(res.headers.get(UNPRINTABLE_HEADER));
      setMessage(
        unprintable.length
          ? { tone: 'caution', text: `PDF of ${what} downloaded. ${describeUnprintable(unprintable)}` }
          : { tone: 'ok', text: `PDF of ${what} downloaded.` },
      );
    } catch {
      setMessage({ tone: 'fault', text: 'Cannot reach the server. Check the network and try again.' });
    } finally {
      setBusy(null);
    }
  }

  async function sendToPrinter() {
    setBusy('print');
    setMessage(null);
    const res = await apiFetch<{ batchId: string; jobs: PrintJobDto[] }>('/api/v1/print-jobs', {
      method: 'POST',
      body: { ...labels, ...(printer.trim() ? { printer: printer.trim() } : {}) },
    });
    setBusy(null);
    if (!res.ok) {
      setMessage({ tone: 'fault', text: [res.message, ...Object.values(res.fields)].join(': ') });
      return;
    }
    setBatch(res.data.batchId);
    const ids = res.data.jobs.map((j) => j.id);
    setMessage({ tone: 'ok', text: `${what} queued for the printer as job ${ids.length === 1 ? ids[0] : `${ids[0]}–${ids[ids.length - 1]}`}.` });
  }

  return (
    <div className="space-y-6">
      <section className="card space-y-4" aria-labelledby="label-what">
        <h2 id="label-what" className="font-bold">
          What to label
        </h2>
        <fieldset className="flex flex-wrap gap-2">
          <legend className="sr-only">Label kind</legend>
          {TEMPLATES.map((t) => (
            <label
              key={t.id}
              className={`cursor-pointer rounded border px-4 py-2 ${template === t.id ? 'border-forge bg-forge-light font-bold text-forge-dark' : 'border-paper-line bg-paper-card'}`}
            >
              <input
                type="radio"
                name="template"
                value={t.id}
                checked={template === t.id}
                onChange={() => {
                  setTemplate(t.id);
                  setChosen([]);
                  setMessage(null);
                }}
                className="sr-only"
              />
              {t.label}
            </label>
          ))}
        </fieldset>
        <p className="text-sm text-ink-soft">{TEMPLATES.find((t) => t.id === template)!.hint}</p>
        <div>
          <label htmlFor="label-find" className="field-label">
            Find
          </label>
          <input id="label-find" className="field w-72" value={find} onChange={(e) => setFind(e.target.value)} placeholder="Code, part number or order" />
        </div>
        {grid}
        <div className="flex flex-wrap items-end gap-4">
          <div>
            <label htmlFor="label-stock" className="field-label">
              Label stock
            </label>
            <select id="label-stock" className="field" value={chosenStock} onChange={(e) => setStock(e.target.value)}>
              {usable.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="label-printer" className="field-label">
              Printer queue
            </label>
            <input id="label-printer" className="field w-48" value={printer} onChange={(e) => setPrinter(e.target.value)} placeholder="the default one" />
          </div>
          <button type="button" className="btn-quiet" disabled={!chosen.length || busy !== null} onClick={downloadPdf}>
            {busy === 'pdf' ? 'Rendering…' : 'Download PDF'}
          </button>
          <button type="button" className="btn-primary" disabled={!chosen.length || busy !== null} onClick={sendToPrinter}>
            {busy === 'print' ? 'Queueing…' : 'Send to printer'}
          </button>
        </div>
        <p
          role="status"
          aria-live="polite"
          data-testid="label-status"
          className={`min-h-6 text-sm ${message?.tone === 'fault' ? 'text-fault' : message?.tone === 'caution' ? 'text-caution font-medium' : 'text-ink-soft'}`}
        >
          {message?.text ?? (chosen.length ? `${what} chosen.` : 'Tick the rows to label.')}
        </p>
      </section>
      <PrintLog initial={jobs} followBatch={batch} />
    </div>
  );
}
