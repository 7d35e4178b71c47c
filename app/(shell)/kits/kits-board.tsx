'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { BomImportRow, KitDto } from '@/lib/contracts/kits';
import { CsvImport } from '../../_components/csv-import';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { KitCreateForm } from './kit-create-form';

export function KitsBoard({ kits, canEdit }: { kits: KitDto[]; canEdit: boolean }) {
  const router = useRouter();
  const [creating, setCreating] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [filter, setFilter] = useState('');
  const columns: ColDef<KitDto>[] = [
    {
      field: 'code',
      headerName: 'Kit',
      minWidth: 160,
      cellRenderer: (p: ICellRendererParams<KitDto>) =>
        p.data ? (
          <Link href={`/kits/${p.data.id}`} className="text-forge font-medium hover:underline num">
            {p.data.code}
          </Link>
        ) : null,
    },
    { field: 'revision', headerName: 'Rev', maxWidth: 100, cellClass: 'num' },
    { field: 'description', headerName: 'Description', flex: 2, minWidth: 220 },
    { headerName: 'Parts', maxWidth: 110, cellClass: 'num', valueGetter: (p) => p.data?.components.length ?? 0 },
    { headerName: 'In use', maxWidth: 130, valueGetter: (p) => (p.data?.active ? 'Active' : 'Retired') },
  ];
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="kits-filter" className="field-label">
            Find kits
          </label>
          <input id="kits-filter" className="field w-64" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Code or description" />
        </div>
        {canEdit && !creating ? (
          <button type="button" className="btn-primary" onClick={() => setCreating(true)}>
            New kit
          </button>
        ) : null}
      </div>
      {creating ? <KitCreateForm onCancel={() => setCreating(false)} onCreated={(kit) => router.push(`/kits/${kit.id}`)} /> : null}
      <p role="status" aria-live="polite" className="min-h-6 text-sm text-ink-soft" data-testid="kits-notice">
        {notice}
      </p>
      <DataGrid label="Kits" rows={kits} columns={columns} rowId={(k) => String(k.id)} quickFilter={filter} height={fitHeight(kits.length)} />
      {canEdit ? (
        <CsvImport<BomImportRow>
          title="Import bills of material from CSV"
          endpoint="/api/v1/kits/import"
          header="kit_code,revision,description,part_number,quantity,tolerance_below,tolerance_above"
          hint="One line per part. A revision that exists gets its parts replaced, unless orders were released from it. Tolerances are pieces per kit (0 when empty)."
          columns={[
            { key: 'kitCode', column: 'kit_code', label: 'Kit' },
            { key: 'revision', column: 'revision', label: 'Rev' },
            { key: 'description', column: 'description', label: 'Description' },
            { key: 'partNumber', column: 'part_number', label: 'Part number' },
            { key: 'quantity', column: 'quantity', label: 'Qty' },
            { key: 'toleranceBelow', column: 'tolerance_below', label: '−' },
            { key: 'toleranceAbove', column: 'tolerance_above', label: '+' },
            { key: 'action', column: 'action', label: 'Will' },
          ]}
          onCommitted={(n) => {
            setNotice(`${n} bill-of-material line${n === 1 ? '' : 's'} imported.`);
            router.refresh();
          }}
        />
      ) : null}
    </div>
  );
}
