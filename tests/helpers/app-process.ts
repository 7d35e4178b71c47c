// Another app instance just like the one global setup started (same database, mail sink, printer),
// for tests that need a second instance or one they can kill.
import { inject } from 'vitest';
import { startApp } from '../../scripts/next-start';
import './test-env';

export const startAnotherApp = (env: Record<string, string> = {}) => startApp({ ...inject('appEnv'), ...env }, 'test-results');
