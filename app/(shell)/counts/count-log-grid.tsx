'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import Link from 'next/link';
import { useMemo } from 'react';
import { COUNT_PURPOSE_LABELS } from '@/lib/count-purposes';
import { describeWarning } from '@/lib/weighing/warnings';
import type { CountLogRow } from '@/lib/contracts/counts';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { formatGrams } from '../../_components/format';
import { useSiteTime } from '../../_components/site-time';

const columnsAfterWhen: ColDef<CountLogRow>[] = [
  { field: 'partNumber', headerName: 'Part', minWidth: 170, cellClass: 'num', tooltipField: 'description' },
  {
    headerName: 'Count',
    minWidth: 180,
    valueGetter: (p) => p.data?.count,
    cellRenderer: (p: ICellRendererParams<CountLogRow>) =>
      p.data ? (
        <span className="num">
          {p.data.count} <span className="text-ink-faint">{p.data.exact ? 'exact' : `± ${p.data.wholePieceRange}`}</span>
        </span>
      ) : null,
  },
  {
    field: 'exact',
    headerName: 'Exact',
    maxWidth: 110,
    cellRenderer: (p: ICellRendererParams<CountLogRow>) =>
      p.data ? p.data.exact ? <span>yes</span> : <span className="font-medium text-caution">no</span> : null,
  },
  {
    headerName: 'Order / bin',
    minWidth: 140,
    cellClass: 'num',
    valueGetter: (p) => p.data?.orderNumber ?? p.data?.binCode ?? '—',
    cellRenderer: (p: ICellRendererParams<CountLogRow>) =>
      p.data?.orderId ? (
        <Link href={`/orders/${p.data.orderId}`} className="text-forge hover:underline">
          {p.data.orderNumber}
        </Link>
      ) : (
        p.value
      ),
  },
  { field: 'purpose', headerName: 'For', minWidth: 130, valueFormatter: (p) => COUNT_PURPOSE_LABELS[p.value as CountLogRow['purpose']] },
  { field: 'targetQuantity', headerName: 'Target', maxWidth: 120, cellClass: 'num', valueFormatter: (p) => p.value ?? '—' },
  { field: 'net', headerName: 'Net', minWidth: 120, cellClass: 'num', valueFormatter: (p) => formatGrams(p.value) },
  { field: 'sampleQuantity', headerName: 'Sample (pcs)', maxWidth: 140, cellClass: 'num' },
  { field: 'scaleName', headerName: 'Scale', minWidth: 140 },
  { field: 'operatorName', headerName: 'Counted by', minWidth: 150 },
  { headerName: 'Warnings', minWidth: 200, flex: 2, valueGetter: (p) => (p.data?.warnings ?? []).map((w) => describeWarning(w).short).join(', ') || '—' },
];

export function CountLogGrid({ rows }: { rows: CountLogRow[] }) {
  const { when } = useSiteTime();
  const columns = useMemo<ColDef<CountLogRow>[]>(
    () => [{ field: 'at', headerName: 'When', minWidth: 170, valueFormatter: (p) => when(p.value) }, ...columnsAfterWhen],
    [when],
  );
  return (
    <DataGrid
      label="Count log"
      emptyText="No counts match these filters."
      rows={rows}
      columns={columns}
      rowId={(r) => String(r.id)}
      height={fitHeight(rows.length, 620)}
    />
  );
}
