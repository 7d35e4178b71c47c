// The app's own server asks its health route every couple of seconds whether the database answers, so
// that while it does not, pages can be refused with a 503 of their own instead of failing as 500s.
// A health check that times out says nothing (the app may only be busy): the last answer stands.
export interface DatabaseWatch {
  isDown(): boolean;
  stop(): void;
}

export function watchDatabase(healthUrl: string, everyMs = 2_000): DatabaseWatch {
  let down = false;
  let asking = false;
  const ask = async () => {
    if (asking) return;
    asking = true;
    try {
      const res = await fetch(healthUrl, { signal: AbortSignal.timeout(everyMs) });
      const body = (await res.json().catch(() => ({}))) as { database?: string };
      down = res.status === 503 && body.database !== 'ok';
    } catch {
      // no answer in time, or the server is stopping: keep what was known
    } finally {
      asking = false;
    }
  };
  const timer = setInterval(() => void ask(), everyMs);
  timer.unref();
  void ask();
  return { isDown: () => down, stop: () => clearInterval(timer) };
}
