import { describe, it, expect } from 'vitest';
import { DESIGNERS, type DesignerEntry } from '../../../src/core/design/index.ts';
import { SHARED_VIEW_KEYS } from '../../../src/core/model/view.ts';
import { DESIGNER_WORDS, LINK_DICTIONARY, VIEW_WORDS } from '../../../src/share/link/dictionary.ts';
import { sharedView } from '../../../src/share/schema/view.ts';

/** Every word a designer description of the registry can hold: kinds, keys, choices and 'auto'. */
function registryWords(): Set<string> {
  const words = new Set(['kind', 'fs']);
  for (const e of DESIGNERS as readonly DesignerEntry[]) {
    words.add(e.kind);
    for (const p of e.parameters) {
      words.add(p.key);
      if (p.type === 'choice') p.options.forEach((o) => words.add(o.value));
      if (p.type === 'order') words.add('auto');
    }
  }
  return words;
}

describe('the link dictionary', () => {
  it("holds only designer words the registry still knows, so links made before decode to today's descriptions", () => {
    const known = registryWords();
    expect(DESIGNER_WORDS[0]).toBe('designer');
    expect(DESIGNER_WORDS.slice(1).filter((w) => !known.has(w))).toEqual([]);
  });

  it('holds only view keys and values the shared view settings still have', () => {
    const values = new Set<string>(SHARED_VIEW_KEYS);
    for (const key of SHARED_VIEW_KEYS) {
      const schema = sharedView.shape[key].unwrap() as { options?: readonly string[] };
      schema.options?.forEach((o) => values.add(o));
    }
    expect(VIEW_WORDS[0]).toBe('view');
    expect(VIEW_WORDS.slice(1).filter((w) => !values.has(w))).toEqual([]);
  });

  it('has no word twice (an index means one word)', () => {
    expect(new Set(LINK_DICTIONARY).size).toBe(LINK_DICTIONARY.length);
  });
});
