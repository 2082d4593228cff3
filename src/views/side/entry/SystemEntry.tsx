/**
 * The system entry: one text box for every form the parser reads. Apply (button or Ctrl/Cmd+Enter) loads
 * the system as one undo step; a parse error is shown in place and the design and the text stay as they were.
 */
import { useId, useState, type RefObject } from 'react';
import type { InputError } from '../../../core/types.ts';
import { problemPlace } from '../../../core/model/check.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { postNotice } from '../../../store/notices.ts';
import { ExampleChips } from './ExampleChips.tsx';
import { ParseErrorView } from './ParseErrorView.tsx';
import { typedAbout } from './entryText.ts';
import { loadEntryReader } from './loadEntryReader.ts';
import { shortcutAction } from '../../shortcuts.ts';

interface Props {
  text: string;
  setText: (t: string) => void;
  area: RefObject<HTMLTextAreaElement | null>;
}

export function SystemEntry({ text, setText, area }: Props) {
  const [error, setError] = useState<{ text: string; error: InputError } | null>(null);
  const [readAs, setReadAs] = useState<string | null>(null);
  const [keepMask, setKeepMask] = useState(false);
  const hasMask = useWorkbench((s) => (s.design.mask?.regions.length ?? 0) > 0);
  const id = useId();

  const apply = async () => {
    let readEntry: Awaited<ReturnType<typeof loadEntryReader>>['readEntry'];
    try {
      ({ readEntry } = await loadEntryReader());
    } catch (e) {
      setError({
        text,
        error: {
          message: `The system was not read: part of the page did not load (${(e as Error).message}). Reload the page to try again; your design is unchanged`,
          position: 0,
        },
      });
      return;
    }
    const r = readEntry(text);
    if (!r.ok) {
      setError({ text, error: r.error });
      const el = area.current;
      const p = Math.min(r.error.position ?? 0, text.length);
      if (el) {
        el.focus();
        el.setSelectionRange(p, Math.min(p + 1, text.length));
      }
      return;
    }
    const { zeros, poles, gain, typed, detail } = r.value;
    const store = workbenchStore.getState();
    const hadMask = hasMask && !keepMask;
    const refused = store.loadTyped(zeros, poles, gain, typed, typedAbout(store.design), {
      mask: keepMask,
    });
    if (refused) {
      setError({
        text,
        error: {
          message: `This system is not loaded: ${problemPlace(refused)}: ${refused.message}`,
          expected: refused.expected,
          position: 0,
        },
      });
      return;
    }
    setError(null);
    setReadAs(detail);
    if (hadMask)
      postNotice(
        'info',
        "The previous design's requirement mask was removed with it (Undo brings it back; tick “Keep the mask” to keep it).",
        { key: 'typed-mask' },
      );
  };

  return (
    <section className="pw-side-section" aria-labelledby={`${id}-h`}>
      <h2 id={`${id}-h`}>System</h2>
      <label htmlFor={id} id={`${id}-hint`} className="pw-hint">
        Difference equation, H(z) in z or z⁻¹, coefficient lists b and a, or zeros/poles/gain
      </label>
      <textarea
        id={id}
        ref={area}
        className={error ? 'pw-entry pw-invalid' : 'pw-entry'}
        aria-label="System text"
        rows={3}
        spellCheck={false}
        autoCapitalize="off"
        autoCorrect="off"
        placeholder="y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-hint ${id}-err` : `${id}-hint`}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => {
          if (shortcutAction('entry', e) === 'apply') {
            e.preventDefault();
            void apply();
          }
        }}
      />
      <div className="pw-entry-bar">
        <button type="button" className="pw-primary" onClick={() => void apply()} disabled={!text.trim()}>
          Apply
        </button>
        <span className="pw-hint">Ctrl/⌘+Enter</span>
        {hasMask && (
          <label className="pw-hint pw-keep-mask">
            <input type="checkbox" checked={keepMask} onChange={(e) => setKeepMask(e.target.checked)} /> Keep
            the mask
          </label>
        )}
        {readAs && !error && (
          <span className="pw-read-as" data-testid="read-as">
            read as: {readAs}
          </span>
        )}
      </div>
      {error && <ParseErrorView id={`${id}-err`} text={error.text} error={error.error} />}
      <ExampleChips
        onPick={(t) => {
          setText(t);
          setError(null);
          area.current?.focus();
        }}
      />
    </section>
  );
}
