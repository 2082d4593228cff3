/**
 * Every keyboard shortcut of the page in one table: its keys, where it acts, and the action it runs. The
 * handlers (the page, the plane, the plots' cross-hairs, the recording plot, the system entry) look a key
 * press up here and run the named action; none of them reads keys for these commands on its own.
 */

/** The parts of a key press a shortcut looks at. */
export interface KeyPress {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  shiftKey?: boolean;
  altKey?: boolean;
  /** The physical key (KeyboardEvent.code), for keys whose character depends on the layout and Shift. */
  code?: string;
}

/** Where a shortcut acts: anywhere on the page, in the z-plane, on a plot with a cross-hair, etc. */
export type ShortcutScope = 'page' | 'plane' | 'cursor' | 'recording' | 'entry';

export interface Shortcut<A extends string = string> {
  scope: ShortcutScope;
  action: A;
  /** The keys as a person reads them. */
  keys: string;
  /** What the shortcut does. */
  does: string;
  matches: (e: KeyPress) => boolean;
}

const ARROWS = new Set(['ArrowLeft', 'ArrowRight', 'ArrowUp', 'ArrowDown']);
/** Ctrl on Linux/Windows or ⌘ on a Mac, without Alt. */
const command = (e: KeyPress) => (e.ctrlKey || e.metaKey) === true && !e.altKey;
/** No Ctrl, ⌘ or Alt: the browser keeps those combinations (Alt+← is Back, Ctrl+PageUp the previous tab). */
const plain = (e: KeyPress) => !e.ctrlKey && !e.metaKey && !e.altKey;
const key =
  (...keys: string[]) =>
  (e: KeyPress) =>
    plain(e) && keys.includes(e.key);

export const SHORTCUTS = [
  {
    scope: 'page',
    action: 'undo',
    keys: 'Ctrl+Z (⌘Z)',
    does: 'undo the last edit of the design',
    matches: (e: KeyPress) => command(e) && e.key.toLowerCase() === 'z' && !e.shiftKey,
  },
  {
    scope: 'page',
    action: 'redo',
    keys: 'Shift+Ctrl+Z (⇧⌘Z), Ctrl+Y',
    does: 'redo what was undone',
    matches: (e: KeyPress) =>
      command(e) &&
      ((e.key.toLowerCase() === 'z' && e.shiftKey === true) || (e.key.toLowerCase() === 'y' && !e.shiftKey)),
  },
  {
    scope: 'plane',
    action: 'nudge-fine',
    keys: 'Shift + arrow',
    does: 'move the selected root by 0.001, or pan the view when none is selected',
    // Never with Alt: Alt+← and Alt+→ are the browser's Back and Forward.
    matches: (e: KeyPress) => plain(e) && ARROWS.has(e.key) && e.shiftKey === true,
  },
  {
    scope: 'plane',
    action: 'nudge',
    keys: 'arrow',
    does: 'move the selected root by 0.01, or pan the view when none is selected',
    matches: (e: KeyPress) => plain(e) && ARROWS.has(e.key),
  },
  {
    scope: 'plane',
    action: 'radius-out',
    keys: 'Page Up (Shift: finer)',
    does: 'move the selected root towards the unit circle from inside (away from it outside) by a tenth of its distance to it',
    matches: key('PageUp'),
  },
  {
    scope: 'plane',
    action: 'radius-in',
    keys: 'Page Down (Shift: finer)',
    does: 'move the selected root towards the origin by a tenth of its distance to the unit circle',
    matches: key('PageDown'),
  },
  {
    scope: 'plane',
    action: 'frequency-up',
    keys: '. or > (Shift: a tenth of the step)',
    does: 'raise the selected pair’s frequency by one step (0.1 Hz at a 1–10 kHz sample rate)',
    matches: (e: KeyPress) => plain(e) && (e.key === '.' || e.key === '>' || e.code === 'Period'),
  },
  {
    scope: 'plane',
    action: 'frequency-down',
    keys: ', or < (Shift: a tenth of the step)',
    does: 'lower the selected pair’s frequency by one step',
    matches: (e: KeyPress) => plain(e) && (e.key === ',' || e.key === '<' || e.code === 'Comma'),
  },
  {
    scope: 'plane',
    action: 'next-root',
    keys: 'N',
    does: 'select the next root (the order of the root table)',
    matches: (e: KeyPress) => plain(e) && !e.shiftKey && e.key.toLowerCase() === 'n',
  },
  {
    scope: 'plane',
    action: 'previous-root',
    keys: 'Shift+N, P',
    does: 'select the previous root',
    matches: (e: KeyPress) =>
      plain(e) && ((e.key.toLowerCase() === 'n' && e.shiftKey === true) || e.key.toLowerCase() === 'p'),
  },
  {
    scope: 'plane',
    action: 'delete-root',
    keys: 'Delete, Backspace',
    does: 'remove the selected root',
    matches: key('Delete', 'Backspace'),
  },
  { scope: 'plane', action: 'zoom-in', keys: '+', does: 'zoom in', matches: key('+', '=') },
  { scope: 'plane', action: 'zoom-out', keys: '−', does: 'zoom out', matches: key('-', '_') },
  {
    scope: 'plane',
    action: 'cancel',
    keys: 'Escape',
    does: 'stop placing a root, then clear the selection',
    matches: key('Escape'),
  },
  {
    scope: 'plane',
    action: 'select-root',
    keys: 'Enter, Space',
    does: 'select the focused root',
    matches: key('Enter', ' '),
  },
  {
    scope: 'cursor',
    action: 'cursor-forward',
    keys: '→ or ↑ (Shift: ten steps)',
    does: 'move the cross-hair one step on',
    matches: key('ArrowRight', 'ArrowUp'),
  },
  {
    scope: 'cursor',
    action: 'cursor-back',
    keys: '← or ↓ (Shift: ten steps)',
    does: 'move the cross-hair one step back',
    matches: key('ArrowLeft', 'ArrowDown'),
  },
  {
    scope: 'cursor',
    action: 'cursor-page-forward',
    keys: 'Page Up',
    does: 'move the cross-hair a page on',
    matches: key('PageUp'),
  },
  {
    scope: 'cursor',
    action: 'cursor-page-back',
    keys: 'Page Down',
    does: 'move the cross-hair a page back',
    matches: key('PageDown'),
  },
  {
    scope: 'cursor',
    action: 'cursor-first',
    keys: 'Home',
    does: 'cross-hair to the start',
    matches: key('Home'),
  },
  { scope: 'cursor', action: 'cursor-last', keys: 'End', does: 'cross-hair to the end', matches: key('End') },
  {
    scope: 'cursor',
    action: 'cursor-off',
    keys: 'Escape',
    does: 'hide the cross-hair',
    matches: key('Escape'),
  },
  {
    scope: 'cursor',
    action: 'zoom-in',
    keys: '+',
    does: 'zoom in about the cross-hair',
    matches: key('+', '='),
  },
  { scope: 'cursor', action: 'zoom-out', keys: '−', does: 'zoom out', matches: key('-', '_') },
  {
    scope: 'cursor',
    action: 'pan-back',
    keys: '< or , (Shift: a whole span)',
    does: 'pan back',
    matches: key('<', ','),
  },
  {
    scope: 'cursor',
    action: 'pan-forward',
    keys: '> or . (Shift: a whole span)',
    does: 'pan on',
    matches: key('>', '.'),
  },
  { scope: 'cursor', action: 'zoom-all', keys: '0', does: 'show the whole axis', matches: key('0') },
  { scope: 'recording', action: 'zoom-in', keys: '+', does: 'zoom in on time', matches: key('+', '=') },
  { scope: 'recording', action: 'zoom-out', keys: '−', does: 'zoom out', matches: key('-') },
  {
    scope: 'recording',
    action: 'pan-back',
    keys: '← (Shift: a whole span)',
    does: 'show earlier samples',
    matches: key('ArrowLeft'),
  },
  {
    scope: 'recording',
    action: 'pan-forward',
    keys: '→ (Shift: a whole span)',
    does: 'show later samples',
    matches: key('ArrowRight'),
  },
  { scope: 'recording', action: 'zoom-all', keys: '0, Home', does: 'show it all', matches: key('0', 'Home') },
  {
    scope: 'entry',
    action: 'apply',
    keys: 'Ctrl+Enter (⌘↩)',
    does: 'apply the typed system',
    matches: (e: KeyPress) => command(e) && e.key === 'Enter',
  },
] as const satisfies readonly Shortcut[];

type ShortcutEntry = (typeof SHORTCUTS)[number];
/** The actions of each scope. */
type ActionsOf = { [S in ShortcutScope]: Extract<ShortcutEntry, { scope: S }>['action'] };
/** The actions of a scope. */
export type ShortcutAction<S extends ShortcutScope> = ActionsOf[S];

/** The action a key press asks for in a scope, or null. */
export function shortcutAction<S extends ShortcutScope>(scope: S, e: KeyPress): ActionsOf[S] | null {
  const found = (SHORTCUTS as readonly Shortcut[]).find((s) => s.scope === scope && s.matches(e));
  return found ? (found.action as ActionsOf[S]) : null;
}

/** Input types where Ctrl+Z belongs to the text field, not to the design. */
const TEXT_INPUT_TYPES = new Set(['text', 'search', 'number', 'email', 'url', 'tel', 'password', '']);

/** True when the event target is a place where the user types text (its own undo applies there). */
export function isTextEntry(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target instanceof HTMLTextAreaElement) return true;
  return target instanceof HTMLInputElement && TEXT_INPUT_TYPES.has(target.type);
}

/** True when the target is a control that uses arrows, Enter or Delete itself (a field, a list, a button). */
export function ownsKeys(target: EventTarget | null): boolean {
  return target instanceof HTMLElement && /^(INPUT|SELECT|TEXTAREA|BUTTON)$/.test(target.tagName);
}
