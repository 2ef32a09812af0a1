/**
 * Window-wide keyboard shortcuts, with a list the help overlay shows. Keys typed into a text field
 * are left alone (except Escape). Listeners are removed when the scope is disposed.
 */
import { onScopeDispose } from 'vue';

export interface Shortcut {
  /** As shown, e.g. "Ctrl+Z". */
  keys: string;
  description: string;
  /** True when the event matches. */
  match(e: KeyboardEvent): boolean;
  run(): void;
}

const ctrl = (e: KeyboardEvent): boolean => e.ctrlKey || e.metaKey;

/** Builds the matcher for a "Ctrl+Shift+Z"-style description. */
export function keyMatcher(keys: string): (e: KeyboardEvent) => boolean {
  const parts = keys.split('+');
  const key = parts[parts.length - 1].toLowerCase();
  const wantCtrl = parts.includes('Ctrl');
  const wantShift = parts.includes('Shift');
  return (e) =>
    ctrl(e) === wantCtrl &&
    (key.length > 1 || /[^a-z]/.test(key) ? true : e.shiftKey === wantShift) &&
    e.key.toLowerCase() === key;
}

export function shortcut(keys: string, description: string, run: () => void): Shortcut {
  return { keys, description, match: keyMatcher(keys), run };
}

export function useKeyboardShortcuts(
  shortcuts: readonly Shortcut[],
  target: Window = window,
): void {
  const onKey = (e: KeyboardEvent): void => {
    const el = e.target as HTMLElement | null;
    const typing =
      !!el && (el.tagName === 'INPUT' || el.tagName === 'SELECT' || el.tagName === 'TEXTAREA');
    if (typing && e.key !== 'Escape') return;
    const s = shortcuts.find((x) => x.match(e));
    if (!s) return;
    e.preventDefault();
    s.run();
  };
  target.addEventListener('keydown', onKey);
  onScopeDispose(() => target.removeEventListener('keydown', onKey));
}
