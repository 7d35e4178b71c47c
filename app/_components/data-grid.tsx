'use client';

import { AllCommunityModule, ModuleRegistry, themeQuartz, type ColDef, type GetRowIdParams } from 'ag-grid-community';
import { AgGridReact } from 'ag-grid-react';
import { useSyncExternalStore } from 'react';
import { CardList } from './card-list';

ModuleRegistry.registerModules([AllCommunityModule]);

// Grid styling in Tallyforge's palette; roomy rows for touch screens at the bench.
const tallyTheme = themeQuartz.withParams({
  accentColor: '#1f5a70',
  backgroundColor: '#fffdf8',
  foregroundColor: '#182229',
  headerBackgroundColor: '#ebe5d8',
  borderColor: '#ddd6c8',
  rowHeight: 48,
  headerHeight: 44,
  fontFamily: 'var(--font-sans)',
  fontSize: 15,
});

// A grid as tall as its rows (header 44 px, rows 48 px, at least three), up to `max`, then it scrolls.
export function fitHeight(rows: number, max = 520): number {
  return Math.min(max, 44 + 48 * Math.max(3, rows) + 2);
}

interface DataGridProps<T> {
  rows: T[];
  columns: ColDef<T>[];
  rowId: (row: T) => string;
  height?: number | string;
  quickFilter?: string;
  label: string;
  // Checkbox rows; the grid reports the chosen rows after every change.
  onSelection?: (rows: T[]) => void;
  // What an empty grid says, in place of the grid library's own words.
  emptyText?: string;
}

// Desk width is where the sidebar shows (Tailwind's lg); below it the rows are cards.
const DESK = '(min-width: 1024px)';
const onWidthChange = (notify: () => void) => {
  const query = window.matchMedia(DESK);
  query.addEventListener('change', notify);
  return () => query.removeEventListener('change', notify);
};

function useDeskWidth(): boolean {
  return useSyncExternalStore(
    onWidthChange,
    () => window.matchMedia(DESK).matches,
    () => true,
  );
}

export function DataGrid<T>({
  rows,
  columns,
  rowId,
  height = 520,
  quickFilter,
  label,
  onSelection,
  emptyText = 'Nothing to show here yet.',
}: DataGridProps<T>) {
  const desk = useDeskWidth();
  if (!desk)
    return <CardList rows={rows} columns={columns} rowId={rowId} label={label} quickFilter={quickFilter} onSelection={onSelection} emptyText={emptyText} />;
  return (
    <div style={{ height }} aria-label={label} role="region">
      <AgGridReact<T>
        theme={tallyTheme}
        rowData={rows}
        columnDefs={columns}
        getRowId={(p: GetRowIdParams<T>) => rowId(p.data)}
        quickFilterText={quickFilter}
        defaultColDef={{ sortable: true, filter: true, resizable: true, flex: 1, minWidth: 110 }}
        animateRows={false}
        localeText={{ noRowsToShow: emptyText }}
        rowSelection={onSelection ? { mode: 'multiRow', selectAll: 'filtered' } : undefined}
        onSelectionChanged={onSelection ? (e) => onSelection(e.api.getSelectedRows()) : undefined}
        // Every column stays in the page, so narrow screens scroll instead of dropping cells
        // that find-in-page and screen readers would miss.
        suppressColumnVirtualisation
        // Rows added later (a new print job on top) keep the DOM in display order for screen readers.
        ensureDomOrder
      />
    </div>
  );
}
