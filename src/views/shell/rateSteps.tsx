/**
 * What the Sample rate field does with a new rate (loaded after the first paint, or when first used): changes
 * it keeping the design in hertz (the store's changeSampleRate), or first asks, in plain words, whether roots
 * placed by hand keep their frequencies in Hz (the default, focused) or their places in the plane.
 */
import { useEffect, useRef } from 'react';
import type { Result } from '../../core/types.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { postNotice } from '../../store/notices.ts';
import { whenDesignEngine } from '../../store/designEngine.ts';
import { withRateChange } from '../../store/rateChange.ts';
import type { RateChoice, RatePlan } from '../../store/sampleRate.ts';
import { preferredUnit, rateText } from './sampleRate.ts';

/** Which roots the question is about, in words. */
const handWords = {
  placed: 'These roots were placed by hand.',
  edited: 'These roots were moved by hand since they were designed.',
  parts:
    'Some roots were placed by hand, or moved since their part was designed (the parts as designed are designed again at the new rate either way).',
} as const;

/** What happened, posted as a notice; returns why nothing changed, or null. */
function said(r: Result<string>): string | null {
  if (!r.ok) return `Not changed: ${r.error.message}${r.error.expected ? `; ${r.error.expected}` : ''}.`;
  if (r.value) postNotice('info', `${r.value} Undo restores the previous rate and design.`, { key: 'rate' });
  return null;
}

/**
 * Applies the rate with the choice, posting what happened; returns why nothing changed, or null, or a
 * promise of that when a designer must run and the design algorithms are still loading.
 */
function change(hz: number, choice?: RateChoice): string | null | Promise<string | null> {
  const r = workbenchStore.getState().changeSampleRate(hz, choice);
  return r instanceof Promise ? r.then(said) : said(r);
}

const loadFailed = (e: unknown) =>
  `Not changed: the code for it could not be loaded (${e instanceof Error ? e.message : String(e)}); reload the page and change the rate again.`;

/**
 * A rate committed in the field: asks (ui.ask) when roots placed by hand need the question, else changes it.
 * Returns why nothing changed, or null; a later answer (the designers still loading) goes to ui.refuse.
 */
export function commitRate(
  hz: number,
  ui: { ask: () => void; refuse: (m: string | null) => void },
): string | null {
  // Whether to ask needs the designers (is the design still theirs?): it may wait for them.
  const go = (plan: RatePlan): string | null => {
    if (plan === 'ask') {
      ui.ask();
      return null;
    }
    const m = change(hz);
    if (!(m instanceof Promise)) return m;
    void m.then(ui.refuse);
    return null;
  };
  const plan = withRateChange((m) => whenDesignEngine(() => m.ratePlan(workbenchStore.getState().design)));
  if (!(plan instanceof Promise)) return go(plan);
  plan.then(
    (p) => ui.refuse(go(p)),
    (e: unknown) => ui.refuse(loadFailed(e)),
  );
  return null;
}

/** The question's answer: the change with that choice (its message to done), or nothing for Cancel. */
export function answerRate(hz: number, choice: RateChoice | null, done: (m: string | null) => void): void {
  if (!choice) return done(null);
  const m = change(hz, choice);
  if (m instanceof Promise) void m.then(done);
  else done(m);
}

export function RateQuestion({
  from,
  to,
  onAnswer,
}: {
  from: number;
  to: number;
  /** The choice, or null to leave the rate as it was. */
  onAnswer: (choice: RateChoice | null) => void;
}) {
  const first = useRef<HTMLButtonElement>(null);
  const how = useWorkbench((s) => (s.design.parts ? 'parts' : s.design.designer ? 'edited' : 'placed'));
  // Focus the default answer only once the key that committed the field is released: Enter's keypress
  // would otherwise land on the focused button and answer the question unasked.
  useEffect(() => {
    const focus = () => first.current?.focus();
    const timer = setTimeout(focus, 400);
    const up = () => {
      clearTimeout(timer);
      focus();
    };
    window.addEventListener('keyup', up, { once: true });
    return () => {
      clearTimeout(timer);
      window.removeEventListener('keyup', up);
    };
  }, []);
  const unit = (hz: number) => rateText(hz, preferredUnit(hz)) + ' ' + preferredUnit(hz);
  const factor = Number((to / from).toPrecision(3));
  return (
    <div
      className="pw-rate-question"
      role="alertdialog"
      aria-labelledby="pw-rate-q"
      data-testid="rate-question"
      onKeyDown={(e) => {
        if (e.key === 'Escape') onAnswer(null);
      }}
    >
      <p id="pw-rate-q">
        Sample rate {unit(from)} → {unit(to)}. {handWords[how]} What should stay the same?
      </p>
      <button type="button" className="pw-primary" ref={first} onClick={() => onAnswer('keep-hz')}>
        Their frequencies in Hz (move the roots)
      </button>
      <button type="button" onClick={() => onAnswer('keep-places')}>
        Their places in the plane (frequencies × {factor})
      </button>
      <button type="button" onClick={() => onAnswer(null)}>
        Cancel
      </button>
    </div>
  );
}
