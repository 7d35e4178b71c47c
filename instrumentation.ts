// Next.js calls register() once per server process: start the scheduled jobs there.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === 'nodejs' && process.env.TF_JOBS !== '0') {
    const { startScheduler } = await import('./server/jobs/scheduler');
    startScheduler();
  }
}
