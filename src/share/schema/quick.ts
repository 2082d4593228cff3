/**
 * A hand-written reader for design documents of the current version, as the workbench itself writes them
 * (autosaved sessions, links, its own files), so the page can open them before the zod schemas (reader.ts)
 * have loaded. It never refuses: it returns the document only when it is sure the full reader (migrate.ts)
 * would accept the same value and give the same result, and null otherwise ("ask the full reader", which
 * also gives the message saying what is wrong). The shape is checked here, field by field as the schemas
 * of v2.ts, mask.ts, designer.ts and view.ts describe it; the bounds by the design door (core/model/check.ts),
 * which the full reader runs as well. test/share/schema/quick.test.ts holds the two readers to agreeing.
 */
import { designerShape, type DesignerSpec } from '../../core/design/light.ts';
import type { ImplementationSettings } from '../../core/fixed/index.ts';
import { validateSettings } from '../../core/fixed/index.ts';
import type { RequirementMask } from '../../core/mask/index.ts';
import { designProblem } from '../../core/model/check.ts';
import type { Design } from '../../core/model/design.ts';
import {
  MAX_SAMPLE_RATE,
  RESPONSE_POINTS_MAX,
  RESPONSE_POINTS_MIN,
  TIME_SAMPLES_MAX,
  TIME_SAMPLES_MIN,
} from '../../core/model/limits.ts';
import type { SharedView } from '../../core/model/view.ts';
import type { Root } from '../../core/types.ts';
import type { CurrentDocument } from './migrate.ts';
import { CURRENT_VERSION } from './version.ts';

type Obj = Record<string, unknown>;

/** Not sure: the full reader decides. */
class Unsure extends Error {}
const unsure = (): never => {
  throw new Unsure();
};

const isObject = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);
const has = (o: Obj, k: string) => Object.prototype.hasOwnProperty.call(o, k);
const object = (v: unknown): Obj => (isObject(v) ? v : unsure());
const list = (v: unknown): unknown[] => (Array.isArray(v) ? v : unsure());
const oneOf = <T extends string>(v: unknown, options: readonly T[]): T =>
  options.includes(v as T) ? (v as T) : unsure();
const whole = (v: unknown, lo: number, hi: number): number =>
  typeof v === 'number' && Number.isInteger(v) && v >= lo && v <= hi ? v : unsure();
const finite = (v: unknown): number => (typeof v === 'number' && Number.isFinite(v) ? v : unsure());
const text = (v: unknown): string => (typeof v === 'string' ? v : unsure());

/** An optional key: absent, or present with a value `read` takes (a present undefined is refused by zod). */
function optional<T>(o: Obj, key: string, read: (v: unknown) => T, into: Obj): void {
  if (!has(o, key)) return;
  if (o[key] === undefined) unsure();
  into[key] = read(o[key]);
}

/** Roots keep their three fields (bounds: the door). */
const roots = (v: unknown): Root[] =>
  list(v).map((r) => {
    const o = object(r);
    return { re: o.re as number, im: o.im as number, multiplicity: o.multiplicity as number };
  });

function gainRule(v: unknown): Design['gainRule'] {
  const o = object(v);
  const kind = oneOf(o.kind, ['fixed', 'dc', 'nyquist', 'frequency', 'peak'] as const);
  if (kind === 'fixed') return { kind, value: finite(o.value) };
  if (kind === 'frequency') return { kind, hz: finite(o.hz) };
  return { kind };
}

function typed(v: unknown): NonNullable<Design['typed']> {
  const o = object(v);
  return { b: [...list(o.b)] as number[], a: [...list(o.a)] as number[], text: text(o.text) };
}

/** A designer as its registry entry describes it: kind, fs and its parameters in the entry's order. */
function designer(v: unknown): DesignerSpec {
  const o = object(v);
  const entry = typeof o.kind === 'string' ? designerShape(o.kind) : undefined;
  if (!entry || entry.kind !== o.kind) return unsure();
  const out: Obj = { kind: entry.kind, fs: finite(o.fs) };
  for (const p of entry.parameters) {
    if (!has(o, p.key) || o[p.key] === undefined) {
      if (p.presence === 'required') unsure();
      if (has(o, p.key)) unsure();
      continue;
    }
    // Values are bounded by the door; lists are copied so the document owns them.
    out[p.key] = Array.isArray(o[p.key]) ? [...(o[p.key] as unknown[])] : o[p.key];
  }
  return out as unknown as DesignerSpec;
}

function mask(v: unknown): RequirementMask {
  const o = object(v);
  const regions = list(o.regions).map((r) => {
    const g = object(r);
    const out: Obj = {
      id: text(g.id),
      kind: oneOf(g.kind, ['pass', 'stop', 'band'] as const),
      fromHz: g.fromHz,
      toHz: g.toHz,
    };
    optional(g, 'upperDb', finite, out);
    optional(g, 'lowerDb', finite, out);
    optional(g, 'label', text, out);
    return out;
  });
  return { regions } as unknown as RequirementMask;
}

function implementation(v: unknown): ImplementationSettings {
  const o = object(v);
  const s: ImplementationSettings = {
    structure: oneOf(o.structure, ['df1', 'df2t'] as const),
    wordLength: whole(o.wordLength, -Infinity, Infinity),
    fractionBits: o.fractionBits === 'auto' ? 'auto' : whole(o.fractionBits, 0, Infinity),
    dataWordLength: whole(o.dataWordLength, -Infinity, Infinity),
    accumulatorBits: whole(o.accumulatorBits, 1, Infinity),
    rounding: oneOf(o.rounding, ['nearest', 'truncate'] as const),
    overflow: oneOf(o.overflow, ['saturate', 'wrap'] as const),
    scaling: oneOf(o.scaling, ['linf', 'l2', 'l1', 'none'] as const),
    ordering: oneOf(o.ordering, ['ascending', 'descending'] as const),
    gainDistribution: oneOf(o.gainDistribution, ['first', 'spread'] as const),
    pairing: oneOf(o.pairing, ['nearest', 'keep-odd'] as const),
    feedbackSign: oneOf(o.feedbackSign, ['denominator', 'negated'] as const),
  };
  optional(o, 'firForm', (f) => oneOf(f, ['direct', 'symmetric'] as const), s as unknown as Obj);
  // The word, fraction and accumulator bounds (a fraction within the word, a product within the
  // accumulator) are the engine's, which the schema runs too.
  return validateSettings(s).ok ? s : unsure();
}

/** A zoomed span [low, high] with `min` ≤ low < high, or null (the whole axis); as view.ts's schema. */
const span =
  (min: number) =>
  (v: unknown): readonly [number, number] | null => {
    if (v === null) return null;
    const l = list(v);
    if (l.length !== 2) unsure();
    const a = finite(l[0]);
    const b = finite(l[1]);
    return a >= min && a < b ? [a, b] : unsure();
  };

function view(v: unknown): SharedView {
  const o = object(v);
  const out: Obj = {};
  optional(o, 'magnitudeScale', (x) => oneOf(x, ['db', 'linear'] as const), out);
  optional(o, 'phaseMode', (x) => oneOf(x, ['wrapped', 'unwrapped'] as const), out);
  optional(o, 'delayUnit', (x) => oneOf(x, ['samples', 'ms'] as const), out);
  optional(o, 'frequencyAxis', (x) => oneOf(x, ['linear', 'log'] as const), out);
  optional(o, 'responsePoints', (x) => whole(x, RESPONSE_POINTS_MIN, RESPONSE_POINTS_MAX), out);
  optional(o, 'timeInput', (x) => oneOf(x, ['impulse', 'step', 'sine', 'noise'] as const), out);
  optional(o, 'sineHz', (x) => (finite(x) >= 0 ? (x as number) : unsure()), out);
  optional(o, 'timeSamples', (x) => whole(x, TIME_SAMPLES_MIN, TIME_SAMPLES_MAX), out);
  optional(o, 'timeStyle', (x) => oneOf(x, ['stems', 'line'] as const), out);
  optional(o, 'noiseSeed', (x) => whole(x, 0, 0xffff_ffff), out);
  optional(o, 'frequencySpan', span(0), out);
  optional(o, 'timeSpan', span(-1), out);
  return out as SharedView;
}

function document(json: unknown): CurrentDocument {
  const o = object(json);
  if (o.polewright !== 'design' || o.version !== CURRENT_VERSION) unsure();
  const name = o.name === undefined ? '' : text(o.name);
  const note = o.note === undefined ? '' : text(o.note);
  const sampleRate = finite(o.sampleRate);
  if (!(sampleRate > 0 && sampleRate <= MAX_SAMPLE_RATE)) unsure();
  const doc: Obj = {
    polewright: 'design',
    version: CURRENT_VERSION,
    name,
    note,
    sampleRate,
    zeros: roots(o.zeros),
    poles: roots(o.poles),
    gainRule: gainRule(o.gainRule),
  };
  optional(o, 'typed', typed, doc);
  optional(o, 'designer', designer, doc);
  // A composed design is rare at start: its parts are left to the full reader (the first view waits for it).
  if (has(o, 'parts')) unsure();
  optional(o, 'mask', mask, doc);
  optional(o, 'implementation', implementation, doc);
  optional(o, 'view', view, doc);
  // The bounds every design keeps, as the full reader checks them last.
  if (designProblem(doc as unknown as Design)) unsure();
  return doc as unknown as CurrentDocument;
}

/**
 * The current-version document in parsed JSON (or a decoded link), exactly as the full reader would give
 * it; null when this reader is not sure (another version, a refusal, anything unusual).
 */
export function quickReadDocument(json: unknown): CurrentDocument | null {
  try {
    return document(json);
  } catch (e) {
    if (e instanceof Unsure) return null;
    throw e;
  }
}

/** The shared view settings of a saved session as the full reader would give them; null when not sure. */
export function quickReadView(json: unknown): SharedView | null {
  try {
    return view(json);
  } catch (e) {
    if (e instanceof Unsure) return null;
    throw e;
  }
}
