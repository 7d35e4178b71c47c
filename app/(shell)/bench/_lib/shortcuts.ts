/**
 * One key per bench step, shown on its button. Keys act only outside text fields, so a scanner
 * typing into the scan box never triggers a step.
 */
export const SHORTCUTS = {
  tare: 't',
  presetTare: 'p',
  sample: 's',
  piece: 'a',
  finishPieces: 'f',
  grow: 'g',
  count: 'n',
  capture: 'c',
  next: 'r',
  scan: '/',
} as const;

export type ShortcutAction = keyof typeof SHORTCUTS;

export function isTypingTarget(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null;
  if (!el || typeof el.tagName !== 'string') return false;
  const tag = el.tagName.toLowerCase();
  if (tag === 'textarea' || tag === 'select' || el.isContentEditable) return true;
  if (tag !== 'input') return false;
  const type = (el as HTMLInputElement).type;
  return !['button', 'checkbox', 'radio', 'submit', 'reset', 'range'].includes(type);
}

/** The step a key press asks for, or null (modifier keys and text fields are left alone). */
export function shortcutFor(event: { key: string; ctrlKey: boolean; metaKey: boolean; altKey: boolean; target: EventTarget | null }): ShortcutAction | null {
  if (event.ctrlKey || event.metaKey || event.altKey || isTypingTarget(event.target)) return null;
  const key = event.key.toLowerCase();
  const found = (Object.keys(SHORTCUTS) as ShortcutAction[]).find((a) => SHORTCUTS[a] === key);
  return found ?? null;
}
