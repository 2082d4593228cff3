/**
 * The door every design passes before the workbench holds it: the bounds of limits.ts checked on a whole
 * design. The store runs it on every edit, typed entry and designer result, the command line on every design
 * it reads or makes, and the file/link/session schemas on every design they read, so all of them accept
 * exactly the same designs. Parts identical (===) to those of an already accepted design are not checked
 * again, which keeps a drag step cheap.
 */
import type { Root } from '../types.ts';
import { designerShape, orderMax, type DesignerSpec } from '../design/light.ts';
import type { RequirementMask } from '../mask/index.ts';
import { validateSettings } from '../fixed/index.ts';
import { shortNumber } from '../shortNumber.ts';
import type { Design } from './design.ts';
import {
  MAX_COEFFICIENTS,
  MAX_MASK_REGIONS,
  MAX_MULTIPLICITY,
  MAX_NAME_CHARS,
  MAX_NOTE_CHARS,
  MAX_ORDER,
  MAX_PARTS,
  MAX_REGION_ID_CHARS,
  MAX_REGION_LABEL_CHARS,
  MAX_SAMPLE_RATE,
  MAX_TYPED_TEXT_CHARS,
  MAX_WHOLE_ITEM,
} from './limits.ts';

/** What is wrong with a design: where (a path of field names and indices), what, and what is accepted. */
export interface DesignProblem {
  path: (string | number)[];
  message: string;
  expected: string;
}

const fmt = (v: number) => shortNumber(v, 10);

/** Order of a stored root list: conjugates and multiplicities counted. */
export function orderOf(list: readonly { im: number; multiplicity: number }[]): number {
  let n = 0;
  for (const r of list) n += r.multiplicity * (r.im > 0 ? 2 : 1);
  return n;
}

/** "zeros.3.re"-style text of a problem's place, or "the design" at the top. */
export function problemPlace(p: DesignProblem): string {
  return p.path.length ? p.path.join('.') : 'the design';
}

/** One line for a user: place, what is wrong, what is accepted. */
export function describeProblem(p: DesignProblem): string {
  return `${problemPlace(p)}: ${p.message} (accepted: ${p.expected})`;
}

type Check = (path: (string | number)[]) => DesignProblem | null;

const problem = (path: (string | number)[], message: string, expected: string): DesignProblem => ({
  path,
  message,
  expected,
});

/** A lone UTF-16 surrogate cannot be written as UTF-8, so text holding one would not survive a file. */
const LONE_SURROGATE = /\p{Cs}/u;

/** Plain text of at most `max` characters, well-formed Unicode. */
export function textProblem(
  text: unknown,
  max: number,
  path: (string | number)[],
  what: string,
): DesignProblem | null {
  if (typeof text !== 'string') return problem(path, `${what} is not text`, 'text');
  if (text.length > max)
    return problem(path, `${what} is ${text.length} characters long`, `at most ${max} characters`);
  if (LONE_SURROGATE.test(text))
    return problem(path, `${what} holds a lone surrogate (broken Unicode)`, 'well-formed Unicode text');
  return null;
}

const isFinite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function finiteProblem(
  v: unknown,
  path: (string | number)[],
  what = 'a finite number',
): DesignProblem | null {
  return isFinite(v) ? null : problem(path, `${String(v)} is not ${what}`, what);
}

/** The roots of one list: finite, stored above the axis, multiplicities and order within bounds. */
export function rootsProblem(list: readonly Root[], kind: 'zeros' | 'poles'): DesignProblem | null {
  if (list.length > MAX_ORDER)
    return problem([kind], `${list.length} ${kind} are listed`, `at most ${MAX_ORDER}`);
  for (let i = 0; i < list.length; i++) {
    const r = list[i]!;
    const at = [kind, i];
    const bad =
      finiteProblem(r.re, [...at, 're']) ??
      finiteProblem(r.im, [...at, 'im']) ??
      (r.im >= 0
        ? null
        : problem(
            [...at, 'im'],
            `${fmt(r.im)} is below 0`,
            '≥ 0 (a complex root is stored once, above the axis)',
          ));
    if (bad) return bad;
    const m = r.multiplicity;
    if (!Number.isInteger(m) || m < 1 || m > MAX_MULTIPLICITY)
      return problem(
        [...at, 'multiplicity'],
        `multiplicity ${fmt(m)} is not accepted`,
        `a whole number from 1 to ${MAX_MULTIPLICITY}`,
      );
  }
  const n = orderOf(list);
  if (n > MAX_ORDER)
    return problem(
      [kind],
      `the ${kind} have order ${n} (conjugates and multiplicities counted)`,
      `an order of at most ${MAX_ORDER}`,
    );
  return null;
}

function gainRuleProblem(rule: Design['gainRule']): DesignProblem | null {
  switch (rule.kind) {
    case 'fixed':
      return finiteProblem(rule.value, ['gainRule', 'value']);
    case 'frequency':
      return isFinite(rule.hz) && rule.hz >= 0
        ? null
        : problem(['gainRule', 'hz'], `${String(rule.hz)} Hz is not accepted`, 'a frequency ≥ 0 Hz');
    case 'dc':
    case 'nyquist':
    case 'peak':
      return null;
    default:
      return problem(
        ['gainRule', 'kind'],
        'the gain rule is of an unknown kind',
        'fixed, dc, nyquist, frequency, peak',
      );
  }
}

function coefficientsProblem(list: readonly number[], path: (string | number)[]): DesignProblem | null {
  if (list.length < 1 || list.length > MAX_COEFFICIENTS)
    return problem(path, `${list.length} coefficients`, `1 to ${MAX_COEFFICIENTS} coefficients`);
  for (let i = 0; i < list.length; i++) {
    const bad = finiteProblem(list[i], [...path, i]);
    if (bad) return bad;
  }
  return null;
}

function typedProblem(typed: NonNullable<Design['typed']>): DesignProblem | null {
  return (
    coefficientsProblem(typed.b, ['typed', 'b']) ??
    coefficientsProblem(typed.a, ['typed', 'a']) ??
    textProblem(typed.text, MAX_TYPED_TEXT_CHARS, ['typed', 'text'], 'the typed text')
  );
}

/** A designer description as its registry entry describes it: kinds, numbers, lists, orders and choices. */
function designerProblem(spec: DesignerSpec, base: (string | number)[] = ['designer']): DesignProblem | null {
  const at = (k: string, i?: number) => (i === undefined ? [...base, k] : [...base, k, i]);
  const entry = designerShape(spec.kind);
  if (!entry)
    return problem(
      at('kind'),
      `the designer kind "${String(spec.kind)}" is not known`,
      'a kind of the designer registry',
    );
  const values = spec as unknown as Record<string, unknown>;
  const whole = (v: unknown, max: number) =>
    typeof v === 'number' && Number.isInteger(v) && v >= 1 && v <= max;
  const bad = finiteProblem(values.fs, at('fs'));
  if (bad) return bad;
  for (const p of entry.parameters) {
    const v = values[p.key];
    if (v === undefined) continue;
    switch (p.type) {
      case 'number': {
        const max = p.max ?? MAX_WHOLE_ITEM;
        if (p.range === 'whole' ? !whole(v, max) : !isFinite(v))
          return problem(
            at(p.key),
            `${String(v)} is not accepted`,
            p.range === 'whole' ? `a whole number from 1 to ${max}` : 'a finite number',
          );
        break;
      }
      case 'order':
        if (v !== 'auto' && !whole(v, orderMax(p, values)))
          return problem(
            at(p.key),
            `order ${String(v)} is not accepted`,
            `1 to ${orderMax(p, values)}, or auto`,
          );
        break;
      case 'list': {
        const list = Array.isArray(v) ? (v as unknown[]) : null;
        const min = p.item === 'band' ? 1 : 0;
        if (!list || list.length < min || list.length > p.count.max)
          return problem(at(p.key), `${list ? list.length : 'no'} values`, `${min} to ${p.count.max} values`);
        for (let i = 0; i < list.length; i++) {
          const item = list[i];
          if (p.item === 'band' ? !isFinite(item) : !whole(item, MAX_WHOLE_ITEM))
            return problem(
              at(p.key, i),
              `${String(item)} is not accepted`,
              p.item === 'band' ? 'a finite number' : `a whole number from 1 to ${MAX_WHOLE_ITEM}`,
            );
        }
        break;
      }
      case 'choice':
        if (!p.options.some((o) => o.value === v))
          return problem(at(p.key), `"${String(v)}" is not known`, p.options.map((o) => o.value).join(', '));
    }
  }
  return null;
}

/** Count, unique ids, text lengths and finite numbers of a mask's regions (Nyquist is the mask view's). */
function maskProblem(mask: RequirementMask): DesignProblem | null {
  const { regions } = mask;
  if (regions.length > MAX_MASK_REGIONS)
    return problem(['mask', 'regions'], `${regions.length} regions`, `at most ${MAX_MASK_REGIONS}`);
  const seen = new Set<string>();
  for (let i = 0; i < regions.length; i++) {
    const r = regions[i]!;
    const at = (k: string) => ['mask', 'regions', i, k];
    const bad =
      textProblem(r.id, MAX_REGION_ID_CHARS, at('id'), 'the id') ??
      (r.id.length === 0 ? problem(at('id'), 'the id is empty', 'a unique id, e.g. r1') : null) ??
      (seen.has(r.id) ? problem(at('id'), `"${r.id}" is used twice`, 'a unique id per region') : null) ??
      finiteProblem(r.fromHz, at('fromHz')) ??
      finiteProblem(r.toHz, at('toHz')) ??
      (r.upperDb === undefined ? null : finiteProblem(r.upperDb, at('upperDb'))) ??
      (r.lowerDb === undefined ? null : finiteProblem(r.lowerDb, at('lowerDb'))) ??
      (r.label === undefined ? null : textProblem(r.label, MAX_REGION_LABEL_CHARS, at('label'), 'the label'));
    if (bad) return bad;
    seen.add(r.id);
  }
  return null;
}

/**
 * The parts of a composed design (parts.ts): two to MAX_PARTS, each a designer description or the one hand
 * part (last), owning runs of roots that add up to the design's lists, with a finite gain.
 */
function partsProblem(design: Design): DesignProblem | null {
  const parts = design.parts!;
  if (parts.length < 2 || parts.length > MAX_PARTS)
    return problem(
      ['parts'],
      `${parts.length} parts`,
      `2 to ${MAX_PARTS} parts (one designed part is kept as "designer")`,
    );
  if (design.designer)
    return problem(['designer'], 'a composed design has a designer of its own', 'the designers in its parts');
  let zeros = 0;
  let poles = 0;
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i]!;
    const at = (k: string) => ['parts', i, k];
    const count = (v: unknown) => typeof v === 'number' && Number.isInteger(v) && v >= 0 && v <= MAX_ORDER;
    if (!count(p.zeros))
      return problem(at('zeros'), `${String(p.zeros)} is not a count of roots`, 'a whole number ≥ 0');
    if (!count(p.poles))
      return problem(at('poles'), `${String(p.poles)} is not a count of roots`, 'a whole number ≥ 0');
    const bad =
      finiteProblem(p.gain, at('gain')) ??
      (p.designer ? designerProblem(p.designer, ['parts', i, 'designer']) : null);
    if (bad) return bad;
    if (!p.designer && i !== parts.length - 1)
      return problem(['parts', i], 'the roots placed by hand are not the last part', 'the hand part last');
    zeros += p.zeros;
    poles += p.poles;
  }
  if (zeros !== design.zeros.length || poles !== design.poles.length)
    return problem(
      ['parts'],
      `the parts own ${zeros} zeros and ${poles} poles but the design stores ${design.zeros.length} and ${design.poles.length}`,
      "parts whose roots add up to the design's",
    );
  return null;
}

/**
 * The first way the design breaks the workbench's bounds, or null when it is within them. With `accepted`
 * (a design already checked), parts that are the very same objects are skipped.
 */
export function designProblem(design: Design, accepted?: Design): DesignProblem | null {
  const same = <K extends keyof Design>(k: K) => accepted !== undefined && design[k] === accepted[k];
  const checks: [keyof Design, Check][] = [
    [
      'sampleRate',
      (p) =>
        isFinite(design.sampleRate) && design.sampleRate > 0 && design.sampleRate <= MAX_SAMPLE_RATE
          ? null
          : problem(
              p,
              `${String(design.sampleRate)} Hz is not accepted`,
              `a sample rate above 0 and at most ${fmt(MAX_SAMPLE_RATE)} Hz`,
            ),
    ],
    ['zeros', () => rootsProblem(design.zeros, 'zeros')],
    ['poles', () => rootsProblem(design.poles, 'poles')],
    ['gainRule', () => gainRuleProblem(design.gainRule)],
    ['name', (p) => textProblem(design.name, MAX_NAME_CHARS, p, 'the name')],
    ['note', (p) => textProblem(design.note, MAX_NOTE_CHARS, p, 'the note')],
    ['typed', () => (design.typed ? typedProblem(design.typed) : null)],
    ['designer', () => (design.designer ? designerProblem(design.designer) : null)],
    ['mask', () => (design.mask ? maskProblem(design.mask) : null)],
    [
      'implementation',
      (p) => {
        if (!design.implementation) return null;
        const r = validateSettings(design.implementation);
        return r.ok ? null : problem(p, r.error.message, r.error.expected ?? 'valid fixed-point settings');
      },
    ],
  ];
  for (const [key, check] of checks) {
    if (same(key)) continue;
    const bad = check([key]);
    if (bad) return bad;
  }
  // The parts are checked against the root lists too, so a change of either checks them again.
  if (design.parts && !(same('parts') && same('zeros') && same('poles') && same('designer')))
    return partsProblem(design);
  return null;
}
