'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { OrderDto } from '@/lib/contracts/orders';
import { apiFetch } from '../../../_components/api-client';

const POLL_MS = 3000;
const live = (o: OrderDto) => o.status !== 'complete' && o.status !== 'cancelled';

// Follows one order while it is open: polls the order route and keeps the last good value when a
// refresh fails, saying so instead of blanking the page.
export function useOrder(initial: OrderDto) {
  const [order, setOrder] = useState(initial);
  const [stale, setStale] = useState<string | null>(null);
  const [checkedAt, setCheckedAt] = useState<Date | null>(null);
  const busy = useRef(false);

  const refresh = useCallback(async () => {
    if (busy.current) return;
    busy.current = true;
    const res = await apiFetch<{ order: OrderDto }>(`/api/v1/orders/${initial.id}`);
    busy.current = false;
    if (res.ok) {
      setOrder(res.data.order);
      setStale(null);
      setCheckedAt(new Date());
    } else setStale(res.message);
  }, [initial.id]);

  const isLive = live(order);
  useEffect(() => {
    if (!isLive) return;
    const timer = setInterval(() => {
      if (!document.hidden) void refresh();
    }, POLL_MS);
    return () => clearInterval(timer);
  }, [isLive, refresh]);

  return { order, replace: setOrder, refresh, stale, checkedAt, live: isLive };
}
