import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { SHORTCUTS, shortcutAction, type KeyPress } from '../../src/views/shortcuts.ts';

const press = (key: string, mods: Partial<KeyPress> = {}): KeyPress => ({ key, ...mods });

describe('the shortcut table', () => {
  it('maps Ctrl/Cmd+Z, Shift+Ctrl/Cmd+Z and Ctrl+Y to undo and redo', () => {
    expect(shortcutAction('page', press('z', { ctrlKey: true }))).toBe('undo');
    expect(shortcutAction('page', press('z', { metaKey: true }))).toBe('undo');
    expect(shortcutAction('page', press('Z', { ctrlKey: true, shiftKey: true }))).toBe('redo');
    expect(shortcutAction('page', press('y', { ctrlKey: true }))).toBe('redo');
    expect(shortcutAction('page', press('z'))).toBeNull();
    expect(shortcutAction('page', press('z', { ctrlKey: true, altKey: true }))).toBeNull();
  });

  it("gives the plane's keys their actions, the fine nudge before the plain one", () => {
    expect(shortcutAction('plane', press('ArrowUp'))).toBe('nudge');
    expect(shortcutAction('plane', press('ArrowUp', { shiftKey: true }))).toBe('nudge-fine');
    // Alt+arrows are the browser's (Alt+← is Back): the plane leaves them alone.
    expect(shortcutAction('plane', press('ArrowUp', { altKey: true }))).toBeNull();
    expect(shortcutAction('plane', press('ArrowLeft', { altKey: true }))).toBeNull();
    expect(shortcutAction('plane', press('PageUp'))).toBe('radius-out');
    expect(shortcutAction('plane', press('PageDown', { shiftKey: true }))).toBe('radius-in');
    expect(shortcutAction('plane', press('.'))).toBe('frequency-up');
    expect(shortcutAction('plane', press('>', { shiftKey: true, code: 'Period' }))).toBe('frequency-up');
    expect(shortcutAction('plane', press(':', { shiftKey: true, code: 'Period' }))).toBe('frequency-up');
    expect(shortcutAction('plane', press(','))).toBe('frequency-down');
    expect(shortcutAction('plane', press('n'))).toBe('next-root');
    expect(shortcutAction('plane', press('N', { shiftKey: true }))).toBe('previous-root');
    expect(shortcutAction('plane', press('p'))).toBe('previous-root');
    expect(shortcutAction('plane', press('ArrowUp', { ctrlKey: true }))).toBeNull();
    expect(shortcutAction('plane', press('Backspace'))).toBe('delete-root');
    expect(shortcutAction('plane', press('='))).toBe('zoom-in');
    expect(shortcutAction('plane', press('_'))).toBe('zoom-out');
    expect(shortcutAction('entry', press('Enter', { metaKey: true }))).toBe('apply');
    expect(shortcutAction('entry', press('Enter'))).toBeNull();
  });

  it('lets no two shortcuts of one place answer the same key press', () => {
    const keys = [
      'z',
      'Z',
      'y',
      'ArrowUp',
      'ArrowLeft',
      'Delete',
      '+',
      '-',
      'Escape',
      'Enter',
      ' ',
      'Home',
      '0',
      'PageUp',
      'PageDown',
      '.',
      ',',
      'n',
      'N',
      'p',
    ];
    const mods: Partial<KeyPress>[] = [
      {},
      { shiftKey: true },
      { ctrlKey: true },
      { ctrlKey: true, shiftKey: true },
    ];
    for (const scope of new Set(SHORTCUTS.map((s) => s.scope)))
      for (const key of keys)
        for (const m of mods) {
          const hits = SHORTCUTS.filter((s) => s.scope === scope && s.matches(press(key, m)));
          // The fine nudge and the nudge overlap on purpose: the table is read in order.
          if (hits.length > 1)
            expect(
              hits.map((h) => h.action),
              `${scope} ${key}`,
            ).toEqual(['nudge-fine', 'nudge']);
        }
  });

  it("leaves the browser's own shortcuts to the browser", () => {
    // common practice: the keys Chromium, Firefox and Safari keep for themselves (history, tabs, page zoom,
    // find, reload, address bar), on Linux/Windows and on a Mac.
    const reserved: KeyPress[] = [
      press('ArrowLeft', { altKey: true }), // Back
      press('ArrowRight', { altKey: true }), // Forward
      press('ArrowLeft', { metaKey: true }), // Back (Mac)
      press('ArrowRight', { metaKey: true }), // Forward (Mac)
      press('[', { metaKey: true }),
      press(']', { metaKey: true }),
      press('PageUp', { ctrlKey: true }), // previous tab
      press('PageDown', { ctrlKey: true }), // next tab
      press('Tab', { ctrlKey: true }),
      press('Home', { altKey: true }), // home page
      press('F5'),
      press('r', { ctrlKey: true }),
      press('l', { ctrlKey: true }),
      press('t', { ctrlKey: true }),
      press('w', { ctrlKey: true }),
      press('n', { ctrlKey: true }),
      press('f', { ctrlKey: true }),
      press('p', { ctrlKey: true }),
      press('d', { ctrlKey: true }),
      press('h', { ctrlKey: true }),
      press('+', { ctrlKey: true }),
      press('-', { ctrlKey: true }),
      press('0', { ctrlKey: true }),
      press('/'), // Firefox quick find
      press("'"), // Firefox quick find (links)
      press('F6'),
      press('F11'),
      press('F12'),
    ];
    for (const k of reserved) {
      const hits = SHORTCUTS.filter((s) => s.matches(k)).map((s) => `${s.scope} ${s.action}`);
      expect(hits, JSON.stringify(k)).toEqual([]);
    }
  });

  it('is the one place that names shortcut keys: elsewhere a control reads only its own keys', () => {
    const views = fileURLToPath(new URL('../../src/views', import.meta.url));
    const files = (dir: string): string[] =>
      readdirSync(dir).flatMap((f) => {
        const p = join(dir, f);
        return statSync(p).isDirectory() ? files(p) : /\.tsx?$/.test(p) ? [p] : [];
      });
    // Fields commit on Enter and revert on Escape; lists, tabs and menus move with arrows, Home and End.
    const CONTROL_KEYS = /^(Enter|Escape| |Tab|Home|End|ArrowUp|ArrowDown|ArrowLeft|ArrowRight)$/;
    const named: string[] = [];
    for (const f of files(views)) {
      if (f.endsWith('shortcuts.ts')) continue;
      for (const m of readFileSync(f, 'utf8').matchAll(/\b(?:e|event)\.key\s*===?\s*'([^']*)'/g))
        if (!CONTROL_KEYS.test(m[1]!)) named.push(`${relative(views, f)}: '${m[1]}'`);
    }
    expect(named).toEqual([]);
  });
});
