'use client';

import Link from 'next/link';
import { ORDER_STATUS_WORDS, STATUS_STYLE } from '@/lib/order-words';
import type { AvailabilityLine, OrderDto } from '@/lib/contracts/orders';
import { useSiteTime } from '../../../_components/site-time';
import { AvailabilityPanel } from './availability-panel';
import { OrderActions } from './order-actions';
import { OrderLines } from './order-lines';
import { useOrder } from './use-order';

interface Props {
  initial: OrderDto;
  initialAvailability: AvailabilityLine[] | null;
  canManage: boolean;
}

export function OrderView({ initial, initialAvailability, canManage }: Props) {
  const { order, replace, stale, checkedAt, live } = useOrder(initial);
  const { when, clock } = useSiteTime();
  const { linesDone, lines } = order.progress;
  const share = lines ? Math.round((linesDone / lines) * 100) : 0;
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <p className="text-sm">
          <Link href="/orders" className="text-forge hover:underline">
            Build orders
          </Link>
        </p>
        <h1 className="page-title flex flex-wrap items-center gap-3">
          <span className="num">{order.number}</span>
          <span className={`rounded px-2 py-1 text-base font-medium ${STATUS_STYLE[order.status]}`} data-testid="order-status">
            {ORDER_STATUS_WORDS[order.status]}
          </span>
        </h1>
        <p className="text-ink-soft">
          {order.quantity} ×{' '}
          <Link href={`/kits/${order.kitId}`} className="text-forge hover:underline">
            {order.kitCode} rev {order.kitRevision}
          </Link>{' '}
          — {order.kitDescription} · {order.dueDate ? `due ${order.dueDate}` : 'no due date'}
          {order.completedAt ? ` · completed ${when(order.completedAt)}` : order.releasedAt ? ` · released ${when(order.releasedAt)}` : ''}
        </p>
      </header>

      <section className="card space-y-2" aria-labelledby="progress-title">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="progress-title" className="font-bold">
            Progress
          </h2>
          <p className="text-sm text-ink-faint" aria-live="off">
            {live ? (
              stale ? (
                <span className="text-caution">Not updated: {stale}</span>
              ) : (
                `Updates by itself${checkedAt ? ` · checked ${clock(checkedAt)}` : ''}`
              )
            ) : (
              'Closed'
            )}
          </p>
        </div>
        <p role="status" aria-live="polite" className="text-lg" data-testid="order-progress">
          <span className="num font-bold">
            {linesDone} / {lines}
          </span>{' '}
          lines in tolerance
        </p>
        <div className="h-3 rounded-full bg-paper-deep overflow-hidden" aria-hidden="true">
          <div className="h-full bg-ok transition-[width]" style={{ width: `${share}%` }} />
        </div>
        {order.overrideReason ? <p className="text-sm text-caution">Completed with lines outside tolerance: {order.overrideReason}</p> : null}
      </section>

      {/* A draft is about stock and releasing; an open order about its lines. */}
      {order.status === 'draft' && initialAvailability ? <AvailabilityPanel orderId={order.id} initial={initialAvailability} /> : null}
      {order.status === 'draft' && canManage ? <OrderActions order={order} onChanged={replace} /> : null}
      <section className="card space-y-3" aria-labelledby="lines-title">
        <h2 id="lines-title" className="font-bold">
          Lines
        </h2>
        <OrderLines
          lines={order.lines}
          recount={
            canManage && (order.status === 'released' || order.status === 'in_progress')
              ? { orderId: order.id, orderNumber: order.number, version: order.version, onChanged: replace }
              : undefined
          }
        />
        <p className="text-sm text-ink-faint">
          Counts that sell, bill or ship by quantity need a scale verified for legal trade; the ± U figures do not replace that.
        </p>
      </section>

      {order.status !== 'draft' && canManage ? <OrderActions order={order} onChanged={replace} /> : null}
    </div>
  );
}
