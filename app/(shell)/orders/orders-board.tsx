'use client';

import type { ColDef, ICellRendererParams } from 'ag-grid-community';
import Link from 'next/link';
import { ORDER_STATUS_WORDS, STATUS_STYLE } from '@/lib/order-words';
import { pageHref, rangeText, type PageOf } from '@/lib/page-range';
import type { OrderSummaryDto } from '@/lib/contracts/orders';
import { DataGrid, fitHeight } from '../../_components/data-grid';
import { SearchForm } from '../../_components/search-form';
import { OrderCreateForm, type KitChoice } from './order-create-form';

const FILTERS = [
  ['all', 'All'],
  ['open', 'Open'],
  ['draft', 'Drafts'],
  ['in_progress', 'Being kitted'],
  ['complete', 'Complete'],
  ['cancelled', 'Cancelled'],
] as const;

interface Props {
  list: PageOf & { orders: OrderSummaryDto[] };
  status: string;
  q: string;
  kits: KitChoice[];
  canManage: boolean;
  today: string;
}

const isOpen = (o: OrderSummaryDto) => o.status === 'released' || o.status === 'in_progress';

export function OrdersBoard({ list, status, q, kits, canManage, today }: Props) {
  const { orders } = list;
  const columns: ColDef<OrderSummaryDto>[] = [
    {
      field: 'number',
      headerName: 'Order',
      minWidth: 150,
      cellRenderer: (p: ICellRendererParams<OrderSummaryDto>) =>
        p.data ? (
          <Link href={`/orders/${p.data.id}`} className="text-forge font-medium hover:underline num">
            {p.data.number}
          </Link>
        ) : null,
    },
    { headerName: 'Kit', minWidth: 180, flex: 2, valueGetter: (p) => (p.data ? `${p.data.kitCode} rev ${p.data.kitRevision}` : '') },
    { field: 'quantity', headerName: 'Kits', maxWidth: 110, cellClass: 'num' },
    {
      field: 'dueDate',
      headerName: 'Due',
      minWidth: 140,
      cellRenderer: (p: ICellRendererParams<OrderSummaryDto>) => {
        if (!p.data?.dueDate) return <span className="text-ink-faint">none</span>;
        const late = isOpen(p.data) && p.data.dueDate < today;
        return (
          <span className={late ? 'text-fault font-medium' : ''}>
            {p.data.dueDate}
            {late ? ' — late' : ''}
          </span>
        );
      },
    },
    {
      field: 'status',
      headerName: 'Status',
      minWidth: 140,
      valueFormatter: (p) => (p.value ? ORDER_STATUS_WORDS[p.value as OrderSummaryDto['status']] : ''),
      cellRenderer: (p: ICellRendererParams<OrderSummaryDto>) =>
        p.data ? <span className={`rounded px-2 py-1 text-sm ${STATUS_STYLE[p.data.status]}`}>{ORDER_STATUS_WORDS[p.data.status]}</span> : null,
    },
    {
      headerName: 'Lines done',
      minWidth: 150,
      valueGetter: (p) => (p.data ? p.data.progress.linesDone / Math.max(1, p.data.progress.lines) : 0),
      cellRenderer: (p: ICellRendererParams<OrderSummaryDto>) =>
        p.data ? (
          <span className="num">
            {p.data.progress.linesDone} / {p.data.progress.lines}
          </span>
        ) : null,
    },
  ];
  return (
    <div className="space-y-4">
      {canManage ? (
        kits.length ? (
          <OrderCreateForm kits={kits} />
        ) : (
          <p className="card text-ink-soft">
            There are no active kits yet.{' '}
            <Link href="/kits" className="text-forge hover:underline">
              Define a kit
            </Link>{' '}
            first.
          </p>
        )
      ) : null}
      <nav aria-label="Order filter" className="flex flex-wrap gap-2">
        {FILTERS.map(([key, label]) => (
          <Link
            key={key}
            href={pageHref('/orders', { status: key === 'all' ? undefined : key, q }, 1)}
            aria-current={status === key ? 'page' : undefined}
            className={`rounded-full px-3 py-1.5 text-sm border ${status === key ? 'bg-forge text-white border-forge' : 'border-paper-line bg-paper-card hover:bg-paper-deep'}`}
          >
            {label}
          </Link>
        ))}
      </nav>
      <div className="flex flex-wrap items-end gap-3">
        <SearchForm
          action="/orders"
          id="orders-q"
          label="Find orders"
          defaultValue={q}
          placeholder="Order number or kit code"
          keep={{ status: status === 'all' ? undefined : status }}
        />
        <p role="status" className="pb-2 text-sm text-ink-soft" data-testid="orders-summary">
          {`${rangeText(list, orders.length, ['order', 'orders'], q ? 'No orders match' : 'No orders here yet')}${q ? ` starting “${q}”` : ''}.`}
        </p>
      </div>
      <DataGrid label="Build orders" rows={orders} columns={columns} rowId={(o) => String(o.id)} height={fitHeight(orders.length)} />
    </div>
  );
}
