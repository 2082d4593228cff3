/**
 * The shortest coefficient word that keeps the quantized filter stable (and inside the mask, when there is
 * one), found by the engine trying every length from 8 to 32 bits; a button puts it in force. The search
 * runs on request: with a mask it takes a few hundred milliseconds, too long to repeat on every change.
 */
import { useState } from 'react';
import type { ImplementationSettings, WordLengthSearch } from '../../../core/fixed/index.ts';
import type { RequirementMask } from '../../../core/mask/index.ts';
import type { Zpk } from '../../../core/types.ts';
import { rootsZpk, selectWordLengthSearch } from '../../../store/implementationDerived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { patchSettings, useSettings } from './useTarget.ts';

/** What the search depended on; a different word length or accumulator does not change its answer. */
interface Inputs {
  zpk: Zpk;
  fs: number;
  mask: RequirementMask | undefined;
  settings: ImplementationSettings;
}

const IGNORED: readonly (keyof ImplementationSettings)[] = ['wordLength', 'accumulatorBits'];

function sameInputs(a: Inputs, b: Inputs): boolean {
  if (a.zpk !== b.zpk || a.fs !== b.fs || a.mask !== b.mask) return false;
  // Hand-set fraction bits are carried over as integer bits by the search, so compare those instead.
  const intBits = (s: ImplementationSettings) =>
    s.fractionBits === 'auto' ? 'auto' : s.wordLength - 1 - s.fractionBits;
  if (intBits(a.settings) !== intBits(b.settings)) return false;
  return (Object.keys(a.settings) as (keyof ImplementationSettings)[]).every(
    (k) => IGNORED.includes(k) || k === 'fractionBits' || a.settings[k] === b.settings[k],
  );
}

function cellClass(t: WordLengthSearch['trials'][number]): string {
  return t.accepted ? 'pw-trial-pass' : t.stable ? 'pw-trial-outside' : 'pw-trial-unstable';
}

export function WordSearchPart() {
  const settings = useSettings();
  const zpk = useWorkbench(rootsZpk);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const mask = useWorkbench((s) => s.design.mask);
  const dragging = useWorkbench((s) => s.dragging);
  const [found, setFound] = useState<{ inputs: Inputs; search: WordLengthSearch } | null>(null);
  const [busy, setBusy] = useState(false);
  const now: Inputs = { zpk, fs, mask, settings };
  const current = found && sameInputs(found.inputs, now) ? found.search : null;
  const run = () => {
    setBusy(true);
    // Let "Searching…" paint before the main thread is busy.
    window.setTimeout(() => {
      const st = workbenchStore.getState();
      setFound({ inputs: now, search: selectWordLengthSearch(st) });
      setBusy(false);
    }, 20);
  };
  const goal = mask ? 'stable and inside the mask' : 'stable';
  const best = current?.wordLength ?? null;
  return (
    <section className="pw-side-section" aria-labelledby="pw-wordsearch-h">
      <h2 id="pw-wordsearch-h">Shortest word</h2>
      <p className="pw-hint pw-block">
        The fewest coefficient bits (8 to 32) that keep the quantized filter {goal}, other settings as they
        are.
      </p>
      <div className="pw-target-row">
        <button type="button" onClick={run} disabled={busy || dragging}>
          {busy ? 'Searching…' : found && !current ? 'Search again' : 'Find the shortest word'}
        </button>
        {best !== null && (
          <button
            type="button"
            className="pw-primary"
            disabled={best === settings.wordLength}
            onClick={() => patchSettings({ wordLength: best })}
          >
            {best === settings.wordLength ? `Using ${best} bits` : `Use ${best} bits`}
          </button>
        )}
      </div>
      {found && !current && !busy && (
        <p className="pw-hint pw-block">The design or the settings changed since the last search.</p>
      )}
      {current && !mask && (
        <p className="pw-hint pw-block">
          This design has no requirement mask, so only stability is checked: a notch may have gone shallow
          long before the filter turns unstable. Add a mask on the Design page to search against it.
        </p>
      )}
      {current && (
        <div data-testid="word-search" aria-live="polite">
          <p className="pw-target-result">
            {best === null ? (
              <>No word length from 8 to 32 bits keeps it {goal}.</>
            ) : (
              <>
                <strong>{best} bits</strong> is the shortest word that keeps it {goal}
                {current.longerAllPass
                  ? '; every longer word does too.'
                  : '; some longer words do not, so check the one you choose.'}
              </>
            )}
          </p>
          <div className="pw-trials" aria-hidden="true">
            {current.trials.map((t) => (
              <span
                key={t.wordLength}
                className={`pw-trial ${cellClass(t)}${t.wordLength === settings.wordLength ? ' pw-trial-now' : ''}`}
                title={`${t.wordLength} bits: ${t.accepted ? 'passes' : t.stable ? 'stable, outside the mask' : 'not stable'}; largest pole radius ${t.maxPoleRadius.toFixed(7)}`}
              >
                {t.wordLength}
              </span>
            ))}
          </div>
          <p className="pw-hint pw-block pw-trial-key">
            <span className="pw-trial pw-trial-pass" /> passes
            {mask && (
              <>
                {' '}
                <span className="pw-trial pw-trial-outside" /> stable, outside the mask
              </>
            )}{' '}
            <span className="pw-trial pw-trial-unstable" /> not stable
          </p>
        </div>
      )}
    </section>
  );
}
