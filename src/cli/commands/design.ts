/**
 * `polewright design <kind> [parameters]`: runs a designer from flags named for what they are (kinds,
 * flags, examples and the usage all come from the designer registry in src/core/design), prints the
 * result in the shape `analyze` prints (plus the designer, its note, the estimated order and the
 * requirement's margins and mask verdict), and can write a design file.
 */
import {
  DESIGNER_VARIANTS,
  FAMILY_OPTIONS,
  FAMILY_TIE_BREAK,
  isRequired,
  type FamilyChoice,
  runDesigner,
  textFor,
  type DesignValues,
  type DesignerEntry,
  type DesignerSpec,
  type DesignResult,
  type Parameter,
} from '../../core/design/index.ts';
import { evaluateMask, maskFromDesigner, type MaskResult } from '../../core/mask/index.ts';
import { writeDesignFile, writeSharedFile } from '../../share/designFile.ts';
import type { SharedDesign } from '../../share/document.ts';
import { addDesignerPart } from '../../core/model/compose.ts';
import { partsOf } from '../../core/model/parts.ts';
import { resolveGain } from '../../core/gainRule.ts';
import type { Design } from '../../core/model/design.ts';
import { describeProblem, designProblem } from '../../core/model/check.ts';
import { MAX_NAME_CHARS } from '../../core/model/limits.ts';
import { UsageError, parseArgs, readFlagList, readFlagNumber, type ParsedArgs } from '../args.ts';
import { readDesignFileArg, type CliDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { writeFileAtomic } from '../output.ts';
import { analysis, systemLines } from './analyze.ts';
import { shortNumber } from '../../core/shortNumber.ts';
import { formatDb, formatMargin } from '../../core/format.ts';

type Variant = (typeof DESIGNER_VARIANTS)[number];

/** The command line's kinds: every variant of the designer registry, by its command-line name. */
const KINDS = new Map<string, Variant>(DESIGNER_VARIANTS.map((v) => [v.variant.cli, v]));

/** Every kind the command knows, in the order the usage lists them. */
export const DESIGN_KINDS = [...KINDS.keys()];
const COMMON_FLAGS = ['fs', 'out', 'name', 'add-to'];

/** The parameters a kind takes on the command line (those its variant does not fix). */
const parametersOf = ({ entry, variant }: Variant): Parameter[] =>
  entry.parameters.filter((p) => !(p.key in (variant.fixed ?? {})));

const ALL_FLAGS = [
  ...new Set([...COMMON_FLAGS, ...[...KINDS.values()].flatMap((v) => parametersOf(v).map((p) => p.flag))]),
];

const inAlternative = (entry: DesignerEntry, key: string) =>
  (entry.alternatives ?? []).some((a) => a.keys.includes(key));

/** A value as typed on the command line. */
const flagValue = (v: unknown) => (Array.isArray(v) ? v.join(',') : String(v));

/** An example command line for a kind, sharpened by what the user has given so far (e.g. the family). */
function exampleLine(cli: string, { entry, variant }: Variant, given: DesignValues): string {
  const ex = variant.example(given);
  const parts: string[] = [];
  for (const [key, value] of Object.entries(ex)) {
    if (key === 'fs') {
      parts.push(`--fs ${flagValue(value)}`);
      continue;
    }
    const p = entry.parameters.find((q) => q.key === key);
    if (!p || (p.presence === 'optional' && !isRequired(p, ex) && !inAlternative(entry, key))) continue;
    parts.push(`--${p.flag} ${flagValue(value)}`);
  }
  return `polewright design ${cli} ${parts.join(' ')}`;
}

/** One parameter's value from its flag's text (usage errors name the flag). */
function readParameter(p: Parameter, raw: string, kind: string, values: DesignValues): unknown {
  const what = textFor(p.what, values);
  switch (p.type) {
    case 'number':
      return readFlagNumber(p.flag, raw, what, p.unit);
    case 'order':
      return raw.trim() === 'auto' ? 'auto' : readFlagNumber(p.flag, raw, what);
    case 'list':
      return readFlagList(p.flag, raw, what);
    case 'choice': {
      const choices = p.options.map((o) => o.value);
      if (!choices.includes(raw))
        throw new UsageError(
          `--${p.flag} "${raw}" is not known for ${kind}; choose one of ${choices.join(', ')}.`,
        );
      return raw;
    }
  }
}

/** The description a kind's flags give: each parameter read, the choices' defaults, then what is missing. */
function readDescription(kind: string, v: Variant, args: ParsedArgs, fsOfBase?: number): DesignerSpec {
  const { entry, variant } = v;
  const values: Record<string, unknown> = { kind: entry.kind, ...variant.fixed };
  const missing = (p: { flag: string }, what: string) =>
    new UsageError(`--${p.flag} is missing (${what}). Example: ${exampleLine(kind, v, values)}`);
  for (const p of parametersOf(v)) {
    const raw = args.flags.get(p.flag);
    if (raw !== undefined) values[p.key] = readParameter(p, raw, kind, values);
    else if (p.type === 'choice' && p.fallback !== undefined) values[p.key] = p.fallback;
  }
  const fs = args.flags.get('fs');
  if (fs === undefined && fsOfBase === undefined) throw missing({ flag: 'fs' }, 'sample rate in Hz');
  values.fs = fs === undefined ? fsOfBase : readFlagNumber('fs', fs, 'sample rate in Hz', 'Hz');
  if (fsOfBase !== undefined && values.fs !== fsOfBase)
    throw new UsageError(
      `--fs ${fs} differs from the sample rate of the design added to (${fmt(fsOfBase)} Hz); a part is designed at its design's rate: leave --fs out.`,
    );
  for (const alt of entry.alternatives ?? []) {
    const [a, b] = alt.keys.map((k) => entry.parameters.find((p) => p.key === k)!);
    if (values[a!.key] !== undefined && values[b!.key] !== undefined)
      throw new UsageError(`give --${a!.flag} or --${b!.flag}, not both.`);
    if (values[a!.key] === undefined && values[b!.key] === undefined)
      throw missing(a!, `${textFor(a!.what, values)}, or give --${b!.flag}`);
  }
  for (const p of parametersOf(v))
    if (values[p.key] === undefined && isRequired(p, values))
      throw missing(p, textFor(p.what, values) ?? p.flag);
  return values as DesignerSpec;
}

const fmt = (x: number) => shortNumber(x, 6);
/** Levels and margins are printed by the one rule of read-outs (core/format.ts), in ASCII. */
const ASCII = { ascii: true } as const;

/**
 * The designer description a command line asks for (usage errors name the flag and show an example), and
 * the design it is added to with --add-to.
 */
export function designerFromArgs(argv: string[]): {
  spec: DesignerSpec;
  args: ParsedArgs;
  kind: string;
  base: { file: string; shared: SharedDesign } | null;
} {
  const [kind, ...rest] = argv;
  const kinds = DESIGN_KINDS.join(', ');
  if (kind === undefined || kind.startsWith('--'))
    throw new UsageError(`say what to design: one of ${kinds}.`);
  const v = KINDS.get(kind);
  if (!v) throw new UsageError(`unknown kind "${kind}". Kinds: ${kinds}.`);
  const args = parseArgs(rest, ALL_FLAGS, ['json']);
  if (args.positionals.length)
    throw new UsageError(`unexpected "${args.positionals[0]}". Example: ${exampleLine(kind, v, {})}`);
  const flags = parametersOf(v).map((p) => p.flag);
  for (const flag of args.flags.keys())
    if (!COMMON_FLAGS.includes(flag) && !flags.includes(flag))
      throw new UsageError(
        `--${flag} does not apply to ${kind}; it takes ${flags.map((f) => `--${f}`).join(', ')}.`,
      );
  const file = args.flags.get('add-to');
  const base = file === undefined ? null : { file, shared: readDesignFileArg(file) };
  return { spec: readDescription(kind, v, args, base?.shared.design.sampleRate), args, kind, base };
}

/** "Any family": the family picked, every family's least order, and how a tie was broken. */
function familyLines(choice: FamilyChoice): string[] {
  const words = (f: string) => FAMILY_OPTIONS.find((o) => o.value === f)!.label;
  return [
    `family: ${words(choice.picked)}, the least order of any family${choice.tieBroken ? ` (tied on order; ${FAMILY_TIE_BREAK} decided)` : ''}`,
    ...choice.trials.map(
      (t) =>
        `  ${words(t.family).padEnd(13)} ${
          t.order === undefined
            ? `not designable: ${t.refused ?? ''}`
            : `order ${t.order}, group-delay spread across the pass band ${fmt(t.delaySpreadSamples!)} samples`
        }${t.family === choice.picked ? '  <- picked' : ''}`,
    ),
  ];
}

function requirementLines(result: DesignResult, verdict: MaskResult | null): string[] {
  const lines: string[] = [];
  if (result.estimate) lines.push(`order: ${result.estimate.order} (least order meeting the requirement)`);
  if (result.family) lines.push(...familyLines(result.family));
  const m = result.margin;
  if (m) {
    lines.push(
      `pass band: worst loss ${formatDb(m.passbandLossDb, 6, ASCII)} at ${fmt(m.worstPassHz)} Hz, ${formatMargin(m.passMarginDb, 6, ASCII)}`,
      `stop band: least attenuation ${formatDb(m.stopbandAttenuationDb, 6, ASCII)} at ${fmt(m.worstStopHz)} Hz, ${formatMargin(m.stopMarginDb, 6, ASCII)}`,
    );
  }
  if (verdict) {
    lines.push(`requirement mask: ${verdict.pass ? 'PASS' : 'FAIL'}`);
    for (const r of verdict.regions)
      lines.push(
        `  ${r.id}: ${r.pass ? '' : 'FAIL, '}${r.problem ? `not judged: ${r.problem}` : `${formatMargin(r.worstMarginDb, 6, ASCII)}${r.worstMarginDb !== Infinity && Number.isFinite(r.worstAtHz) ? ` at ${fmt(r.worstAtHz)} Hz` : ''}`}`,
      );
  }
  return lines;
}

/** The placeholder of a flag's value in the usage. */
function placeholder(p: Parameter): string {
  if (p.type === 'choice') return p.options.map((o) => o.value).join('|');
  if (p.type === 'order') return 'N|auto';
  if (p.type === 'list') return p.item === 'whole' ? 'n,n,…' : `<${p.unit ?? ''}>[,<${p.unit ?? ''}>]`;
  return p.unit ? `<${p.unit}>` : '<number>';
}

/** What `polewright design --help` prints: every kind with an example, and every parameter with its kinds. */
export function designUsage(): string {
  const byFlag = new Map<string, { p: Parameter; kinds: string[] }>();
  for (const [cli, v] of KINDS)
    for (const p of parametersOf(v)) {
      const seen = byFlag.get(p.flag) ?? { p, kinds: [] };
      seen.kinds.push(cli);
      byFlag.set(p.flag, seen);
    }
  const alternatives = new Set<string>();
  for (const v of KINDS.values())
    for (const alt of v.entry.alternatives ?? []) {
      const [a, b] = alt.keys.map((k) => v.entry.parameters.find((p) => p.key === k)!.flag);
      alternatives.add(`--${a} or --${b}`);
    }
  const lines = [
    'polewright design <kind> [parameters] [--json] [--out design.json] [--name <title>] [--add-to design.json]',
    '',
    'kinds, with an example each:',
    ...DESIGN_KINDS.map((k) => `  ${k.padEnd(15)} ${exampleLine(k, KINDS.get(k)!, {})}`),
    '',
    'parameters (every kind takes --fs <Hz>, the sample rate):',
    ...[...byFlag.values()].map(({ p, kinds }) => {
      const flag = `  --${p.flag} ${placeholder(p)}`;
      const what = textFor(p.what, {});
      const auto = p.type === 'order' ? ` (auto: ${p.autoLabel.toLowerCase()})` : '';
      return `${flag.padEnd(40)} ${what}${auto}; ${kinds.join(', ')}`;
    }),
    '',
    `give one of each pair: ${[...alternatives].join('; ')}.`,
    'numbers read as in the workbench: 0.5 or 0,5, −2, 1e-3, 1/3, and a unit after a frequency (1.2kHz);',
    'lists take commas: --edge 100,200.',
    '--add-to design.json adds the filter to that design as a part of its cascade (a notch on a low-pass), at',
    "the design's sample rate (--fs may be left out); the result goes to --out, or back into the file.",
  ];
  return lines.join('\n') + '\n';
}

/** Runs `design`; returns the exit code (2 for a usage error or a parameter the designer refuses). */
export function runDesign(argv: string[], io: CliIo): number {
  if (argv[0] === '--help' || argv[0] === '-h' || argv[0] === 'help') {
    io.stdout(designUsage());
    return 0;
  }
  const { spec, args, kind, base } = designerFromArgs(argv);
  if (base) return runAddTo(spec, args, kind, base, io);
  const r = runDesigner(spec);
  if (!r.ok) {
    const accepted = r.error.expected ? ` Accepted: ${r.error.expected}.` : '';
    throw new UsageError(`${r.error.message}.${accepted}`);
  }
  const result = r.value;
  const mask = maskFromDesigner(spec);
  const verdict = mask ? evaluateMask(mask, result.zpk, spec.fs) : null;
  const cli: CliDesign = {
    zpk: result.zpk,
    typed: null,
    sampleRate: spec.fs,
    source: `polewright design ${kind}`,
    notes: [],
  };
  const out = {
    ...analysis(cli),
    designer: spec,
    note: result.note,
    ...(result.estimate && { estimate: result.estimate }),
    ...(result.margin && { margin: result.margin }),
    ...(result.family && { family: { ...result.family, tieBreak: FAMILY_TIE_BREAK } }),
    ...(mask && { mask, maskResult: verdict }),
  };
  const design: Design = {
    sampleRate: spec.fs,
    zeros: result.zpk.zeros,
    poles: result.zpk.poles,
    gainRule: { kind: 'fixed', value: result.zpk.gain },
    name: (args.flags.get('name') ?? result.note).slice(0, MAX_NAME_CHARS),
    note: result.note,
    designer: spec,
    ...(mask && { mask }),
  };
  // The workbench's own door: what this command makes, a design file can hold and the page can open.
  const problem = designProblem(design);
  if (problem) throw new UsageError(`the design cannot be kept: ${describeProblem(problem)}.`);
  const file = args.flags.get('out');
  if (file !== undefined) {
    writeFileAtomic(file, writeDesignFile(design));
    io.stderr(`note: wrote ${file}\n`);
  }
  if (args.switches.has('json')) {
    io.stdout(toJson(out));
    return 0;
  }
  const lines = [`designed: ${result.note}`, ...requirementLines(result, verdict)];
  lines.push(`stability: ${out.stability.verdict.toUpperCase()} — ${out.stability.reason}`);
  if (out.coefficientWarning) lines.push(`warning: ${out.coefficientWarning.message}.`);
  lines.push(...systemLines(out));
  io.stdout(lines.join('\n') + '\n');
  return 0;
}

/** The parts of a composed design, one line each. */
function partLines(design: Design): string[] {
  return partsOf(design).map((p, i) => {
    const what = p.designer
      ? `${p.designer.kind} ${Object.entries(p.designer)
          .filter(([k]) => k !== 'kind' && k !== 'fs')
          .map(([k, v]) => `${k}=${flagValue(v)}`)
          .join(' ')}`
      : 'placed by hand';
    return `  ${i + 1}. ${what} (${p.zeros} zeros, ${p.poles} poles stored)`;
  });
}

/**
 * `design <kind> … --add-to file.json`: designs the part at the file's sample rate, adds it to the file's
 * design as a part of the cascade (the whole mask gets the part's requirement carved in), prints the whole,
 * and writes the result to --out, or back into the file (atomically) when no --out is given.
 */
function runAddTo(
  spec: DesignerSpec,
  args: ParsedArgs,
  kind: string,
  base: { file: string; shared: SharedDesign },
  io: CliIo,
): number {
  const r = addDesignerPart(base.shared.design, spec, 'fill');
  if (!r.ok) {
    const accepted = r.error.expected ? ` Accepted: ${r.error.expected}.` : '';
    throw new UsageError(`${r.error.message}.${accepted}`);
  }
  const { design, result } = r.value;
  const problem = designProblem(design);
  if (problem) throw new UsageError(`the design cannot be kept: ${describeProblem(problem)}.`);
  const { gain } = resolveGain(design.zeros, design.poles, design.gainRule, design.sampleRate);
  const zpk = { zeros: design.zeros, poles: design.poles, gain };
  const verdict = design.mask ? evaluateMask(design.mask, zpk, design.sampleRate) : null;
  const cli: CliDesign = {
    zpk,
    typed: null,
    sampleRate: design.sampleRate,
    source: `polewright design ${kind} --add-to ${base.file}`,
    notes: [],
  };
  const target = args.flags.get('out') ?? base.file;
  writeFileAtomic(target, writeSharedFile({ design, view: base.shared.view }));
  io.stderr(`note: wrote ${target}\n`);
  const out = {
    ...analysis(cli),
    added: { designer: { ...spec, fs: design.sampleRate }, note: result.note },
    parts: partsOf(design),
    ...(design.mask && { mask: design.mask, maskResult: verdict }),
  };
  if (args.switches.has('json')) {
    io.stdout(toJson(out));
    return 0;
  }
  const lines = [`added: ${result.note}`, 'parts of the design (a cascade):', ...partLines(design)];
  lines.push(...requirementLines({ zpk, note: '' }, verdict));
  lines.push(`stability: ${out.stability.verdict.toUpperCase()} — ${out.stability.reason}`);
  lines.push(...systemLines(out));
  io.stdout(lines.join('\n') + '\n');
  return 0;
}
