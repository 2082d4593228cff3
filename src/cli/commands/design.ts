/**
 * `polewright design <kind> [parameters]`: runs a designer from flags named for what they are, prints the
 * result in the shape `analyze` prints (plus the designer, its note, the estimated order and the
 * requirement's margins and mask verdict), and can write a design file.
 */
import { writeFileSync } from 'node:fs';
import {
  runDesigner,
  type DesignerSpec,
  type DesignResult,
  type IirFamily,
} from '../../core/design/index.ts';
import { evaluateMask, maskFromDesigner, type MaskResult } from '../../core/mask/index.ts';
import { writeDesignFile } from '../../share/designFile.ts';
import type { Design } from '../../core/model/design.ts';
import { UsageError, parseArgs, readFlagList, readFlagNumber, type ParsedArgs } from '../args.ts';
import type { CliDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { analysis, systemLines } from './analyze.ts';
import { shortNumber } from '../../core/shortNumber.ts';

interface KindInfo {
  /** Flags the kind accepts besides --fs, --json, --out, --name. */
  flags: readonly string[];
  example: string;
  build: (a: FlagReader) => DesignerSpec;
}

/** Reads typed values from the parsed flags, with errors that name the flag and show an example. */
class FlagReader {
  constructor(
    private readonly args: ParsedArgs,
    private readonly kind: string,
    /** Shown with a missing-flag error; a kind may sharpen it once it knows more (e.g. the family). */
    public example: string,
  ) {}
  raw(name: string): string | undefined {
    return this.args.flags.get(name);
  }
  has(name: string): boolean {
    return this.args.flags.has(name);
  }
  missing(name: string, what: string): UsageError {
    return new UsageError(`--${name} is missing (${what}). Example: ${this.example}`);
  }
  number(name: string, what: string): number {
    const raw = this.args.flags.get(name);
    if (raw === undefined) throw this.missing(name, what);
    return readFlagNumber(name, raw, what);
  }
  optionalNumber(name: string, what: string): number | undefined {
    return this.has(name) ? this.number(name, what) : undefined;
  }
  list(name: string, what: string): number[] {
    const raw = this.args.flags.get(name);
    if (raw === undefined) throw this.missing(name, what);
    return readFlagList(name, raw, what);
  }
  choice<T extends string>(name: string, choices: readonly T[], fallback?: T): T {
    const raw = this.args.flags.get(name);
    if (raw === undefined) {
      if (fallback !== undefined) return fallback;
      throw this.missing(name, `one of ${choices.join(', ')}`);
    }
    if (!(choices as readonly string[]).includes(raw))
      throw new UsageError(
        `--${name} "${raw}" is not known for ${this.kind}; choose one of ${choices.join(', ')}.`,
      );
    return raw as T;
  }
  /** A notch or peak width: --bandwidth Hz or --q, exactly one. */
  width(): { bandwidthHz: number } | { q: number } {
    if (this.has('bandwidth') && this.has('q')) throw new UsageError('give --bandwidth or --q, not both.');
    if (this.has('q')) return { q: this.number('q', 'quality factor f0/bandwidth') };
    if (!this.has('bandwidth')) throw this.missing('bandwidth', 'the −3 dB width in Hz, or give --q');
    return { bandwidthHz: this.number('bandwidth', '−3 dB width in Hz') };
  }
}

const FAMILIES: readonly IirFamily[] = ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'];
const IIR_FLAGS = ['family', 'order', 'edge', 'ripple', 'attenuation', 'passband', 'stopband'];

function iirKind(response: 'lowpass' | 'highpass' | 'bandpass' | 'bandstop'): KindInfo {
  const band = response === 'bandpass' || response === 'bandstop';
  const pair = band ? 'low,high in Hz' : 'in Hz';
  const edge = band ? (response === 'bandpass' ? '100,200' : '45,55') : '120';
  return {
    flags: IIR_FLAGS,
    example: `polewright design ${response} --fs 1000 --family butterworth --order 4 --edge ${edge}`,
    build: (a) => {
      const family = a.choice('family', FAMILIES);
      const auto = a.raw('order')?.trim() === 'auto';
      const values = ` --ripple 1 --attenuation 60 --fs 1000`;
      const requirementExample = {
        lowpass: '120 --stopband 400',
        highpass: '400 --stopband 120',
        bandpass: '150,250 --stopband 100,320',
        bandstop: '100,320 --stopband 150,250',
      }[response];
      a.example = auto
        ? `polewright design ${response} --family ${family} --order auto --passband ${requirementExample}${values}`
        : `polewright design ${response} --family ${family} --order 4 --edge ${edge}${family === 'butterworth' ? ' --fs 1000' : values}`;
      const order = auto ? 'auto' : a.number('order', 'a whole number from 1, or auto');
      const needRipple = family === 'chebyshev1' || family === 'elliptic' || auto;
      const needAttenuation = family === 'chebyshev2' || family === 'elliptic' || auto;
      const rippleDb = needRipple
        ? a.number('ripple', 'pass-band ripple in dB')
        : a.optionalNumber('ripple', 'dB');
      const attenuationDb = needAttenuation
        ? a.number('attenuation', 'stop-band attenuation in dB')
        : a.optionalNumber('attenuation', 'dB');
      const requirement = auto || a.has('passband') || a.has('stopband');
      return {
        kind: 'iir',
        fs: a.number('fs', 'sample rate in Hz'),
        family,
        response,
        order,
        ...(!auto && { edgesHz: a.list('edge', `design edge ${pair}`) }),
        ...(rippleDb !== undefined && { rippleDb }),
        ...(attenuationDb !== undefined && { attenuationDb }),
        ...(requirement && {
          passbandHz: a.list('passband', `pass-band edge ${pair}`),
          stopbandHz: a.list('stopband', `stop-band edge ${pair}`),
        }),
      };
    },
  };
}

const KINDS: Record<string, KindInfo> = {
  notch: {
    flags: ['f0', 'bandwidth', 'q'],
    example: 'polewright design notch --fs 1000 --f0 50 --bandwidth 2',
    build: (a) => ({
      kind: 'notch',
      fs: a.number('fs', 'sample rate in Hz'),
      f0: a.number('f0', 'centre in Hz'),
      ...a.width(),
    }),
  },
  peak: {
    flags: ['f0', 'bandwidth', 'q'],
    example: 'polewright design peak --fs 8000 --f0 1200 --q 25',
    build: (a) => ({
      kind: 'peak',
      fs: a.number('fs', 'sample rate in Hz'),
      f0: a.number('f0', 'centre in Hz'),
      ...a.width(),
    }),
  },
  'dc-blocker': {
    flags: ['cutoff'],
    example: 'polewright design dc-blocker --fs 1000 --cutoff 0.5',
    build: (a) => ({
      kind: 'dcBlocker',
      fs: a.number('fs', 'sample rate in Hz'),
      cutoffHz: a.number('cutoff', '−3 dB frequency in Hz'),
    }),
  },
  'harmonic-notch': {
    flags: ['f0', 'harmonics', 'bandwidth', 'q'],
    example: 'polewright design harmonic-notch --fs 2000 --f0 50 --harmonics 1,3,5 --bandwidth 2',
    build: (a) => ({
      kind: 'harmonicNotch',
      fs: a.number('fs', 'sample rate in Hz'),
      f0: a.number('f0', 'fundamental in Hz'),
      harmonics: a.list('harmonics', 'harmonic numbers, 1 = the fundamental'),
      ...a.width(),
    }),
  },
  comb: {
    flags: ['f0', 'bandwidth', 'q', 'teeth'],
    example: 'polewright design comb --fs 1000 --f0 50 --q 30 --teeth notch',
    build: (a) => ({
      kind: 'comb',
      fs: a.number('fs', 'sample rate in Hz'),
      f0: a.number('f0', 'tooth spacing in Hz, fs/f0 whole'),
      type: a.choice('teeth', ['notch', 'peak'] as const, 'notch'),
      ...a.width(),
    }),
  },
  'peaking-eq': {
    flags: ['f0', 'gain-db', 'q', 'octaves'],
    example: 'polewright design peaking-eq --fs 48000 --f0 1000 --gain-db 6 --q 1.4',
    build: (a) => {
      if (a.has('q') && a.has('octaves')) throw new UsageError('give --q or --octaves, not both.');
      const width = a.has('octaves')
        ? { bandwidthOctaves: a.number('octaves', 'bandwidth in octaves') }
        : { q: a.number('q', 'quality factor, or give --octaves') };
      return {
        kind: 'peakingEq',
        fs: a.number('fs', 'sample rate in Hz'),
        f0: a.number('f0', 'centre in Hz'),
        gainDb: a.number('gain-db', 'gain at f0 in dB'),
        ...width,
      };
    },
  },
  'low-shelf': shelf('lowShelf', 'low-shelf'),
  'high-shelf': shelf('highShelf', 'high-shelf'),
  lowpass: iirKind('lowpass'),
  highpass: iirKind('highpass'),
  bandpass: iirKind('bandpass'),
  bandstop: iirKind('bandstop'),
};

function shelf(kind: 'lowShelf' | 'highShelf', name: string): KindInfo {
  return {
    flags: ['f0', 'gain-db', 'q', 'slope'],
    example: `polewright design ${name} --fs 48000 --f0 200 --gain-db -6 --slope 1`,
    build: (a) => {
      if (a.has('q') && a.has('slope')) throw new UsageError('give --q or --slope, not both.');
      const width = a.has('slope')
        ? { slope: a.number('slope', 'shelf slope, 1 = steepest monotone') }
        : { q: a.number('q', 'quality factor, or give --slope') };
      return {
        kind,
        fs: a.number('fs', 'sample rate in Hz'),
        f0: a.number('f0', 'shelf midpoint in Hz'),
        gainDb: a.number('gain-db', 'shelf gain in dB'),
        ...width,
      };
    },
  };
}

/** Every kind the command knows, in the order the usage lists them. */
export const DESIGN_KINDS = Object.keys(KINDS);
const COMMON_FLAGS = ['fs', 'out', 'name'];
const ALL_FLAGS = [...new Set([...COMMON_FLAGS, ...Object.values(KINDS).flatMap((k) => k.flags)])];

/** Margins smaller than this (dB) are printed as 0. */
export const MARGIN_DISPLAY_ZERO_DB = 1e-9;

const fmt = (x: number) => shortNumber(x, 6);
/** A margin in dB with its sign; below MARGIN_DISPLAY_ZERO_DB it reads 0 (meets the limit exactly, to rounding). */
const signed = (x: number) => (Math.abs(x) < MARGIN_DISPLAY_ZERO_DB ? '0' : (x >= 0 ? '+' : '') + fmt(x));

/** The designer description a command line asks for (usage errors name the flag and show an example). */
export function designerFromArgs(argv: string[]): { spec: DesignerSpec; args: ParsedArgs; kind: string } {
  const [kind, ...rest] = argv;
  const kinds = DESIGN_KINDS.join(', ');
  if (kind === undefined || kind.startsWith('--'))
    throw new UsageError(`say what to design: one of ${kinds}.`);
  const info = KINDS[kind];
  if (!info) throw new UsageError(`unknown kind "${kind}". Kinds: ${kinds}.`);
  const args = parseArgs(rest, ALL_FLAGS, ['json']);
  if (args.positionals.length)
    throw new UsageError(`unexpected "${args.positionals[0]}". Example: ${info.example}`);
  for (const flag of args.flags.keys())
    if (!COMMON_FLAGS.includes(flag) && !info.flags.includes(flag))
      throw new UsageError(
        `--${flag} does not apply to ${kind}; it takes ${info.flags.map((f) => `--${f}`).join(', ')}.`,
      );
  const reader = new FlagReader(args, kind, info.example);
  return { spec: info.build(reader), args, kind };
}

function requirementLines(result: DesignResult, verdict: MaskResult | null): string[] {
  const lines: string[] = [];
  if (result.estimate) lines.push(`order: ${result.estimate.order} (least order meeting the requirement)`);
  const m = result.margin;
  if (m) {
    lines.push(
      `pass band: worst loss ${fmt(m.passbandLossDb)} dB at ${fmt(m.worstPassHz)} Hz, margin ${signed(m.passMarginDb)} dB`,
      `stop band: least attenuation ${fmt(m.stopbandAttenuationDb)} dB at ${fmt(m.worstStopHz)} Hz, margin ${signed(m.stopMarginDb)} dB`,
    );
  }
  if (verdict) {
    lines.push(`requirement mask: ${verdict.pass ? 'PASS' : 'FAIL'}`);
    for (const r of verdict.regions)
      lines.push(
        `  ${r.id}: ${r.pass ? 'pass' : 'FAIL'}, worst margin ${signed(r.worstMarginDb)} dB at ${fmt(r.worstAtHz)} Hz`,
      );
  }
  return lines;
}

/** What `polewright design --help` prints: every kind with an example, and the classical-family flags. */
export function designUsage(): string {
  const lines = [
    'polewright design <kind> [parameters] [--json] [--out design.json] [--name <title>]',
    '',
    'kinds, with an example each:',
    ...DESIGN_KINDS.map((k) => `  ${k.padEnd(15)} ${KINDS[k]!.example}`),
    '',
    'low-/high-/band-pass and band-stop:',
    '  --family butterworth|chebyshev1|chebyshev2|elliptic   --order N --edge <Hz> (band shapes: low,high)',
    '  --ripple <dB> (pass-band, Chebyshev I and elliptic)   --attenuation <dB> (stop-band, Chebyshev II and elliptic)',
    '  --order auto --passband <Hz> --stopband <Hz> --ripple <dB> --attenuation <dB>: the least order meeting',
    '  the requirement, with its margins; --passband/--stopband with a fixed order report the margins too.',
    'notch, peak, harmonic-notch, comb: --bandwidth <Hz> (−3 dB width) or --q; comb: --teeth notch|peak.',
  ];
  return lines.join('\n') + '\n';
}

/** Runs `design`; returns the exit code (2 for a usage error or a parameter the designer refuses). */
export function runDesign(argv: string[], io: CliIo): number {
  if (argv[0] === '--help' || argv[0] === '-h' || argv[0] === 'help') {
    io.stdout(designUsage());
    return 0;
  }
  const { spec, args, kind } = designerFromArgs(argv);
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
    ...(mask && { mask, maskResult: verdict }),
  };
  const file = args.flags.get('out');
  if (file !== undefined) {
    const design: Design = {
      sampleRate: spec.fs,
      zeros: result.zpk.zeros,
      poles: result.zpk.poles,
      gainRule: { kind: 'fixed', value: result.zpk.gain },
      name: (args.flags.get('name') ?? result.note).slice(0, 200),
      note: result.note,
      designer: spec,
      ...(mask && { mask }),
    };
    try {
      writeFileSync(file, writeDesignFile(design));
    } catch (e) {
      io.stderr(
        `polewright design: cannot write ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}\n`,
      );
      return 1;
    }
    io.stderr(`note: wrote ${file}\n`);
  }
  if (args.switches.has('json')) {
    io.stdout(toJson(out));
    return 0;
  }
  const lines = [`designed: ${result.note}`, ...requirementLines(result, verdict)];
  lines.push(`stability: ${out.stability.verdict.toUpperCase()} — ${out.stability.reason}`);
  lines.push(...systemLines(out));
  io.stdout(lines.join('\n') + '\n');
  return 0;
}
