// Several app processes on one port (node:cluster): the primary forks them, the kernel hands each new
// connection to one of them, and nothing is kept in a process that another needs (sessions, limits and
// idempotency live in the database), so no request has to come back to the process that served the last.
import cluster, { type Worker } from 'node:cluster';

// The scheduled jobs run in the first process only: the others would only wait on the same locks.
const JOBS_OFF = { TF_JOBS: '0' };
// A process that ends after it was serving is started again, after this pause.
const RESTART_MS = 1_000;

export function runProcesses(count: number, stopGraceMs: number): void {
  const live = new Set<Worker>();
  let stopping = false;
  let exitCode = 0;

  const stop = (code: number) => {
    if (stopping) return;
    stopping = true;
    exitCode = code;
    if (!live.size) process.exit(code);
    for (const worker of live) worker.process.kill('SIGTERM');
    setTimeout(() => process.exit(code), stopGraceMs + 5_000).unref();
  };

  const fork = (index: number) => {
    const worker = cluster.fork({ TF_PROCESS_INDEX: String(index), ...(index > 0 ? JOBS_OFF : {}) });
    let serving = false;
    live.add(worker);
    worker.once('listening', () => (serving = true));
    worker.once('exit', (code, signal) => {
      live.delete(worker);
      if (stopping) {
        if (!live.size) process.exit(exitCode);
        return;
      }
      // One that never served refused to start (it said why): the others would refuse as well.
      if (!serving) {
        console.error(`app process ${index + 1} of ${count} ended before serving (${signal ?? `exit ${code}`}); stopping`);
        return stop(code || 1);
      }
      console.error(`app process ${index + 1} of ${count} ended (${signal ?? `exit ${code}`}); starting it again`);
      setTimeout(() => !stopping && fork(index), RESTART_MS).unref();
    });
  };

  for (let i = 0; i < count; i += 1) fork(i);
  console.log(`Tallyforge: ${count} app processes`);
  process.once('SIGTERM', () => stop(143));
  process.once('SIGINT', () => stop(130));
}
