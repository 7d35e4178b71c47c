'use client';

import type { ColDef } from 'ag-grid-community';
import { useMemo, useState, type ComponentType, type ReactNode } from 'react';

// The same rows and columns as a grid, as cards: below desk width a 12-column grid shows three of
// them, so each row becomes a card holding every column, its links and buttons at touch size.
// Cells are worked out the way the grid does it: valueGetter or field, then cellRenderer or
// valueFormatter.

type Params<T> = { value: unknown; data: T; colDef: ColDef<T> };

function valueOf<T>(col: ColDef<T>, row: T): unknown {
  if (typeof col.valueGetter === 'function') return col.valueGetter({ data: row, colDef: col } as never);
  return col.field ? (row as Record<string, unknown>)[col.field as string] : undefined;
}

function textOf<T>(col: ColDef<T>, row: T): string {
  const value = valueOf(col, row);
  if (typeof col.valueFormatter === 'function') return String(col.valueFormatter({ value, data: row, colDef: col } as never) ?? '');
  return value === null || value === undefined ? '' : String(value);
}

function Cell<T>({ col, row }: { col: ColDef<T>; row: T }): ReactNode {
  if (typeof col.cellRenderer === 'function') {
    const Renderer = col.cellRenderer as ComponentType<Params<T>>;
    return <Renderer value={valueOf(col, row)} data={row} colDef={col} />;
  }
  return textOf(col, row) || '—';
}

interface CardListProps<T> {
  rows: T[];
  columns: ColDef<T>[];
  rowId: (row: T) => string;
  label: string;
  quickFilter?: string;
  onSelection?: (rows: T[]) => void;
  emptyText: string;
}

export function CardList<T>({ rows, columns, rowId, label, quickFilter, onSelection, emptyText }: CardListProps<T>) {
  const shown = columns.filter((c) => !c.hide);
  const [title, ...rest] = shown;
  const needle = quickFilter?.trim().toLowerCase() ?? '';
  const visible = useMemo(() => (needle ? rows.filter((r) => shown.some((c) => textOf(c, r).toLowerCase().includes(needle))) : rows), [rows, shown, needle]);
  const [chosen, setChosen] = useState<ReadonlySet<string>>(new Set());
  const choose = (next: Set<string>) => {
    setChosen(next);
    onSelection?.(rows.filter((r) => next.has(rowId(r))));
  };
  const allChosen = visible.length > 0 && visible.every((r) => chosen.has(rowId(r)));
  return (
    <section aria-label={label} className="card-list space-y-3">
      {onSelection && visible.length ? (
        <label className="flex min-h-11 items-center gap-3 font-medium">
          <input type="checkbox" className="h-5 w-5" checked={allChosen} onChange={() => choose(allChosen ? new Set() : new Set(visible.map(rowId)))} />
          Choose all {visible.length} shown
        </label>
      ) : null}
      {visible.length === 0 ? <p className="card text-ink-soft">{emptyText}</p> : null}
      <ul className="grid gap-3 sm:grid-cols-2">
        {visible.map((row) => {
          const id = rowId(row);
          return (
            <li key={id} className="card p-4" data-row-id={id}>
              <div className="flex items-start justify-between gap-3">
                <div className="min-w-0 text-lg font-bold break-words">{title ? <Cell col={title} row={row} /> : null}</div>
                {onSelection ? (
                  <input
                    type="checkbox"
                    className="h-6 w-6 shrink-0"
                    aria-label={`Choose ${title ? textOf(title, row) || id : id}`}
                    checked={chosen.has(id)}
                    onChange={() => {
                      const next = new Set(chosen);
                      if (next.has(id)) next.delete(id);
                      else next.add(id);
                      choose(next);
                    }}
                  />
                ) : null}
              </div>
              <dl className="mt-2 grid grid-cols-[auto_minmax(0,1fr)] gap-x-4 gap-y-1 text-sm">
                {rest.map((col, i) => (
                  <div key={col.colId ?? String(col.field ?? i)} className="contents">
                    <dt className="text-ink-faint">{col.headerName || ' '}</dt>
                    <dd className={`min-w-0 break-words ${typeof col.cellClass === 'string' ? col.cellClass : ''}`}>
                      <Cell col={col} row={row} />
                    </dd>
                  </div>
                ))}
              </dl>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
