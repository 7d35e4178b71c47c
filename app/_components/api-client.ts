// Browser-side JSON calls to /api/v1 with the shared error shape.
export interface ApiFailure {
  ok: false;
  status: number;
  code: string;
  message: string;
  fields: Record<string, string>;
}
export type ApiResult<T> = { ok: true; status: number; data: T } | ApiFailure;

// A FormData body goes as multipart (the browser sets its boundary); anything else as JSON.
export async function apiFetch<T>(path: string, init: { method?: string; body?: unknown; headers?: Record<string, string> } = {}): Promise<ApiResult<T>> {
  let res: Response;
  const multipart = init.body instanceof FormData;
  try {
    res = await fetch(path, {
      method: init.method ?? 'GET',
      headers: { ...(init.body !== undefined && !multipart ? { 'Content-Type': 'application/json' } : {}), ...init.headers },
      body: multipart ? (init.body as FormData) : init.body !== undefined ? JSON.stringify(init.body) : undefined,
      credentials: 'same-origin',
    });
  } catch {
    return { ok: false, status: 0, code: 'offline', message: 'Cannot reach the server. Check the network and try again.', fields: {} };
  }
  if (res.status === 204) return { ok: true, status: 204, data: undefined as T };
  const json = await res.json().catch(() => null);
  if (res.ok) return { ok: true, status: res.status, data: json as T };
  const error = (json as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null)?.error;
  return {
    ok: false,
    status: res.status,
    code: error?.code ?? 'unknown',
    message: error?.message ?? `The server answered ${res.status}`,
    fields: error?.fields ?? {},
  };
}
