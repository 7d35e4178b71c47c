'use client';

import { useEffect, useState } from 'react';
import type { CalibrationVerdict } from '@/lib/metrology/evaluate-calibration';
import { apiFetch } from '../../../_components/api-client';

// Asks the server to judge the test as it is typed; a short pause keeps it to one request per edit,
// and only the answer to the newest body is kept.
export function useLiveVerdict(body: object | null): { verdict: CalibrationVerdict | null; problem: string | null } {
  const key = body ? JSON.stringify(body) : null;
  const [state, setState] = useState<{ key: string | null; verdict: CalibrationVerdict | null; problem: string | null }>({
    key: null,
    verdict: null,
    problem: null,
  });
  useEffect(() => {
    if (!key) return;
    let current = true;
    const timer = setTimeout(async () => {
      const res = await apiFetch<CalibrationVerdict>('/api/v1/calibration/evaluate', { method: 'POST', body: JSON.parse(key) });
      if (!current) return;
      setState(res.ok ? { key, verdict: res.data, problem: null } : { key, verdict: null, problem: Object.values(res.fields)[0] ?? res.message });
    }, 250);
    return () => {
      current = false;
      clearTimeout(timer);
    };
  }, [key]);
  return key && state.key === key ? state : { verdict: null, problem: null };
}
