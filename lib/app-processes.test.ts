import { describe, expect, it } from 'vitest';
import { appProcesses } from './app-processes';

describe('appProcesses', () => {
  it('runs one process unless told otherwise, one per core for auto', () => {
    expect(appProcesses(undefined, 8)).toEqual({ processes: 1 });
    expect(appProcesses('  ', 8)).toEqual({ processes: 1 });
    expect(appProcesses('AUTO', 2)).toEqual({ processes: 2 });
    expect(appProcesses('3', 2)).toEqual({ processes: 3 });
  });

  it('refuses what is not a whole number from 1 to 64', () => {
    for (const bad of ['0', '-2', '1.5', '2e1', 'two', '65', '0x2'])
      expect(appProcesses(bad, 2)).toHaveProperty('error', expect.stringContaining('APP_PROCESSES'));
  });
});
