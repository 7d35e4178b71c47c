/**
 * How many app processes `npm start` runs on this machine, from APP_PROCESSES: a whole number from 1 to
 * 64, or "auto" for one per core. Unset is 1. Anything else is refused with the reason, before starting.
 */
export function appProcesses(setting: string | undefined, cores: number): { processes: number } | { error: string } {
  const text = setting?.trim() ?? '';
  if (text === '') return { processes: 1 };
  if (text.toLowerCase() === 'auto') return { processes: Math.max(1, cores) };
  if (!/^[0-9]+$/.test(text) || Number(text) < 1 || Number(text) > 64)
    return { error: `APP_PROCESSES is a whole number from 1 to 64, or auto (one per core); it is "${setting}"` };
  return { processes: Number(text) };
}
