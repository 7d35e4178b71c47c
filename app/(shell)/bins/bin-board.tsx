'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import { rangeText, type PageOf } from '@/lib/page-range';
import type { BinDto } from '@/lib/contracts/bins';
import type { LastVariance } from '@/lib/contracts/bins';
import { DataGrid } from '../../_components/data-grid';
import { SearchForm } from '../../_components/search-form';
import { useSiteTime } from '../../_components/site-time';
import { BenchLink } from './bench-link';

export type BinRow = BinDto & { lastVariance: LastVariance | null };

const STATUS_WORDS: Record<string, string> = { applied: 'booked', pending: 'awaiting approval', approved: 'approved', rejected: 'rejected, recount' };

function VarianceCell({ value }: { value: LastVariance | null }) {
  if (!value) return <span className="text-ink-faint">not counted</span>;
  const tone = value.status === 'pending' ? 'text-caution' : value.status === 'rejected' ? 'text-fault' : 'text-ink';
  return (
    <span className={tone}>
      <span className="num">
        {value.variance > 0 ? '+' : ''}
        {value.variance}
      </span>{' '}
      pcs · {STATUS_WORDS[value.status] ?? value.status}
    </span>
  );
}

export function BinBoard({ list, q, canCount, canPrint }: { list: PageOf & { bins: BinRow[] }; q: string; canCount: boolean; canPrint: boolean }) {
  const rows = list.bins;
  const { when } = useSiteTime();
  const columns: ColDef<BinRow>[] = [
    { field: 'code', headerName: 'Bin', minWidth: 140, cellClass: 'num' },
    { field: 'partNumber', headerName: 'Part', minWidth: 140 },
    { field: 'bookQuantity', headerName: 'Book qty', maxWidth: 130, type: 'numericColumn', cellClass: 'num' },
    { field: 'abcClass', headerName: 'ABC', maxWidth: 90 },
    { field: 'lastCountedAt', headerName: 'Last counted', minWidth: 180, valueFormatter: (p) => (p.value ? when(p.value) : 'never') },
    {
      field: 'lastVariance',
      headerName: 'Last variance',
      minWidth: 200,
      comparator: (a: LastVariance | null, b: LastVariance | null) => Math.abs(a?.variance ?? 0) - Math.abs(b?.variance ?? 0),
      filter: false,
      cellRenderer: (p: ICellRendererParams<BinRow>) => <VarianceCell value={p.data?.lastVariance ?? null} />,
    },
    ...(canCount
      ? [
          {
            headerName: '',
            colId: 'count',
            sortable: false,
            filter: false,
            width: 180,
            flex: 0,
            cellRenderer: (p: ICellRendererParams<BinRow>) => (p.data ? <BenchLink code={p.data.code} /> : null),
          } satisfies ColDef<BinRow>,
        ]
      : []),
    ...(canPrint
      ? [
          {
            headerName: '',
            colId: 'label',
            sortable: false,
            filter: false,
            width: 150,
            flex: 0,
            cellRenderer: (p: ICellRendererParams<BinRow>) =>
              p.data ? (
                <a
                  href={`/api/v1/bins/${p.data.id}/label.pdf?stock=4x2in`}
                  target="_blank"
                  rel="noopener"
                  className="text-forge hover:underline"
                  aria-label={`Label for bin ${p.data.code} (PDF)`}
                >
                  Label (PDF)
                </a>
              ) : null,
          } satisfies ColDef<BinRow>,
        ]
      : []),
  ];
  return (
    <section aria-labelledby="bins-title" className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="bins-title" className="text-lg font-bold">
          All bins
        </h2>
        <SearchForm action="/bins" id="bin-filter" label="Find bins" defaultValue={q} placeholder="Start of a bin code or part number" />
      </div>
      <p role="status" className="text-sm text-ink-soft" data-testid="bins-summary">
        {`${rangeText(list, rows.length, ['bin', 'bins'], q ? 'No bins match' : 'No bins yet')}${q ? ` starting “${q}”` : ''}.`}
      </p>
      <DataGrid label="Bins" rows={rows} columns={columns} rowId={(b) => String(b.id)} height={Math.min(480, 46 + Math.max(rows.length, 3) * 48)} />
    </section>
  );
}
