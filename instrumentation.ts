// Next.js calls register() once per server process, before it answers: check it is safe to serve
// where it is bound, then start the scheduled jobs.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { assertSafeToServe } = await import('./server/auth/demo-password-guard');
  await assertSafeToServe(process.env.HOST ?? '127.0.0.1');
  if (process.env.TF_JOBS !== '0') {
    const { startScheduler } = await import('./server/jobs/scheduler');
    startScheduler();
  }
}
