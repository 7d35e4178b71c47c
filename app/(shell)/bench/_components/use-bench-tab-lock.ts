'use client';

import { useCallback, useEffect, useRef, useState } from 'react';

// One bench per browser profile: the count in progress and the offline queue live in this browser's
// storage, so a second tab would overwrite the first one's work. A Web Lock (held while the tab
// is open, released by the browser when it closes or reloads) decides which tab counts.
// Without the Web Locks API (plain http on a LAN address) there is no guard.
const LOCK_NAME = 'tallyforge.bench';

export type BenchTabState = 'checking' | 'held' | 'elsewhere' | 'taken';

export function useBenchTabLock(): { state: BenchTabState; takeOver: () => void } {
  const [state, setState] = useState<BenchTabState>('checking');
  const takeOverRef = useRef<() => void>(() => {});

  useEffect(() => {
    const locks = navigator.locks;
    if (!locks) {
      setState('held');
      return;
    }
    let disposed = false;
    let release: (() => void) | null = null;
    let waiting: AbortController | null = null;

    const hold = (lock: Lock | null) => {
      if (disposed || !lock) return undefined;
      setState('held');
      return new Promise<void>((resolve) => {
        release = resolve;
      });
    };
    // This tab's lock was stolen by a tab that took the bench over: wait for it to be given back.
    const lost = () => {
      if (disposed) return;
      release = null;
      setState('taken');
      wait();
    };
    // Queue for the lock: granted when the other tab closes or reloads. Aborting the wait (to take
    // over instead) rejects it too; only a rejection that was not ours means the lock was stolen.
    const wait = () => {
      const controller = new AbortController();
      waiting = controller;
      locks.request(LOCK_NAME, { signal: controller.signal }, hold).catch(() => {
        if (!controller.signal.aborted) lost();
      });
    };
    takeOverRef.current = () => {
      waiting?.abort();
      locks.request(LOCK_NAME, { steal: true }, hold).catch(lost);
    };

    locks
      .request(LOCK_NAME, { ifAvailable: true }, (lock) => {
        if (lock) return hold(lock);
        if (!disposed) setState('elsewhere');
        wait();
        return undefined;
      })
      .catch(lost);
    return () => {
      disposed = true;
      waiting?.abort();
      (release as (() => void) | null)?.();
    };
  }, []);

  return { state, takeOver: useCallback(() => takeOverRef.current(), []) };
}
