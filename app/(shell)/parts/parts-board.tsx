'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { pageRange, type PageOf } from '@/lib/page-range';
import type { PartDto, PartImportRow } from '@/lib/contracts/parts';
import { CsvImport } from '../../_components/csv-import';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { SearchForm } from '../../_components/search-form';
import { PartForm } from './part-form';

interface Props {
  list: PageOf & { parts: PartDto[] };
  q: string;
  canEdit: boolean;
  defaultSpread: number;
}

const percent = (x: number) => `${(x * 100).toFixed(1)} %`;

export function PartsBoard({ list, q, canEdit, defaultSpread }: Props) {
  const { parts, total } = list;
  const shown = pageRange(list, parts.length);
  const router = useRouter();
  const [editing, setEditing] = useState<PartDto | 'new' | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  const columns: ColDef<PartDto>[] = [
    { field: 'partNumber', headerName: 'Part number', minWidth: 210, cellClass: 'num' },
    { field: 'description', headerName: 'Description', minWidth: 220, flex: 2 },
    {
      field: 'hasPhoto',
      headerName: 'Photo',
      maxWidth: 90,
      filter: false,
      cellRenderer: (p: ICellRendererParams<PartDto>) =>
        p.data?.hasPhoto ? (
          // eslint-disable-next-line @next/next/no-img-element -- a signed-in route: next/image would fetch it without the session
          <img
            src={`/api/v1/parts/${p.data.id}/photo?v=${p.data.version}`}
            alt={`Photo of ${p.data.partNumber}`}
            loading="lazy"
            className="my-1 h-8 w-8 rounded object-cover"
          />
        ) : (
          <span className="text-ink-faint">—</span>
        ),
    },
    { field: 'countingMethod', headerName: 'Counted by', minWidth: 130, maxWidth: 150, valueFormatter: (p) => (p.value === 'hand' ? 'Hand' : 'Scale') },
    {
      field: 'averagePieceWeight',
      headerName: 'APW (g)',
      minWidth: 120,
      cellClass: 'num',
      valueFormatter: (p) => (p.value === null || p.value === undefined ? 'not learned' : Number(p.value).toPrecision(6)),
    },
    { field: 'apwSampleSize', headerName: 'Sample (pcs)', maxWidth: 140, cellClass: 'num', valueFormatter: (p) => p.value ?? '—' },
    {
      field: 'pieceSpread',
      headerName: 'Piece spread',
      minWidth: 170,
      valueGetter: (p) => p.data?.pieceSpread ?? defaultSpread,
      cellRenderer: (p: ICellRendererParams<PartDto>) =>
        p.data?.spreadLearned ? (
          <span className="num">
            {percent(p.data.pieceSpread!)} <span className="text-ink-faint font-sans">learned ({p.data.spreadObservations})</span>
          </span>
        ) : (
          <span className="num">
            {percent(defaultSpread)} <span className="text-caution font-sans">assumed</span>
          </span>
        ),
    },
    ...(canEdit
      ? [
          {
            headerName: '',
            sortable: false,
            filter: false,
            maxWidth: 110,
            cellRenderer: (p: ICellRendererParams<PartDto>) => (
              <button type="button" className="text-forge hover:underline" onClick={() => setEditing(p.data!)} aria-label={`Edit ${p.data?.partNumber}`}>
                Edit
              </button>
            ),
          } satisfies ColDef<PartDto>,
        ]
      : []),
  ];

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <SearchForm action="/parts" id="parts-q" label="Find parts" defaultValue={q} placeholder="Part number or description" />
        <a className="btn-quiet" href={`/api/v1/parts/export${q ? `?q=${encodeURIComponent(q)}` : ''}`} download>
          Download CSV
        </a>
        {canEdit ? (
          <button type="button" className="btn-primary" onClick={() => setEditing('new')}>
            New part
          </button>
        ) : null}
      </div>
      {editing ? (
        <PartForm
          part={editing === 'new' ? null : editing}
          onCancel={() => setEditing(null)}
          onPhotoSaved={(p) => {
            setEditing(p);
            router.refresh();
          }}
          onSaved={(p) => {
            setNotice(`${p.partNumber} saved.`);
            setEditing(null);
            router.refresh();
          }}
        />
      ) : null}
      <p role="status" aria-live="polite" className="min-h-6 text-sm text-ink-soft" data-testid="parts-notice">
        {notice ??
          `${total} part${total === 1 ? '' : 's'}${q ? ` matching “${q}”` : ''}${total > parts.length && parts.length ? `, ${shown.first}–${shown.last} shown` : ''}.`}
      </p>
      <DataGrid label="Parts" rows={parts} columns={columns} rowId={(p) => String(p.id)} height={fitHeight(parts.length)} />
      <p className="text-sm text-ink-faint">
        Spread is how much single pieces differ in weight. Until a part has learned its own from samples, the site default is assumed.
      </p>
      {canEdit ? (
        <CsvImport<PartImportRow>
          title="Import parts from CSV"
          endpoint="/api/v1/parts/import"
          header="part_number,description,counting_method"
          hint="counting_method is scale or hand (scale when empty). Part numbers that already exist are updated."
          columns={[
            { key: 'partNumber', column: 'part_number', label: 'Part number' },
            { key: 'description', column: 'description', label: 'Description' },
            { key: 'countingMethod', column: 'counting_method', label: 'Counted by' },
            { key: 'action', column: 'action', label: 'Will' },
          ]}
          onCommitted={(n) => {
            setNotice(`${n} row${n === 1 ? '' : 's'} imported.`);
            router.refresh();
          }}
        />
      ) : null}
    </div>
  );
}
