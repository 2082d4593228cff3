/**
 * A new designer kind is one registry entry plus its engine function, and its shape for the page's first
 * view (shapes.ts: the checks' view of its parameters; test/core/design/shapes.test.ts fails without it).
 * This test adds one — a moving average of N taps, the simplest FIR filter — to the registry and its
 * shapes and finds it designed, checked, typed on the command line, offered by the Design form, stored in
 * files and links, and described, with nothing else written.
 */
import { describe, it, expect, vi } from 'vitest';
import type { DesignerEntry } from '../../../src/core/design/parameters.ts';

/** H(z) = (1/N)·Σ z^-n: zeros at the N-th roots of unity but z = 1, N − 1 poles at the origin. */
function movingAverageZpk(n: number) {
  const zeros = [];
  for (let k = 1; k < n / 2; k++)
    zeros.push({ re: Math.cos((2 * Math.PI * k) / n), im: Math.sin((2 * Math.PI * k) / n), multiplicity: 1 });
  if (n % 2 === 0) zeros.push({ re: -1, im: 0, multiplicity: 1 });
  return { zeros, poles: n > 1 ? [{ re: 0, im: 0, multiplicity: n - 1 }] : [], gain: 1 / n };
}

vi.mock('../../../src/core/design/registry.ts', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../../src/core/design/registry.ts')>();
  const { defineDesigner } = await import('../../../src/core/design/parameters.ts');
  // The whole of the new kind: its registry entry, whose engine function is movingAverageZpk above.
  const movingAverage = defineDesigner({
    kind: 'movingAverage',
    parameters: [
      {
        key: 'taps',
        flag: 'taps',
        label: 'Taps',
        what: 'how many samples are averaged',
        type: 'number',
        range: 'whole',
        max: 256,
        presence: 'required',
      },
    ],
    variants: [
      {
        id: 'movingAverage',
        cli: 'moving-average',
        label: 'Moving average',
        group: 'Smoothing',
        example: () => ({ fs: 1000, taps: 8 }),
        start: () => ({ taps: 8 }),
      },
    ],
    design: (spec) => ({ zpk: movingAverageZpk(spec.taps), note: `moving average of ${spec.taps} samples` }),
  });
  const designers = [...(original.DESIGNERS as readonly DesignerEntry[]), movingAverage as DesignerEntry];
  const r = original.registryOf(designers);
  return {
    ...original,
    DESIGNERS: designers,
    DESIGNER_VARIANTS: r.variants,
    designerEntry: r.entry,
    variantOf: r.variantOf,
  };
});

// Its shape: what the first view's checks read of its parameters.
vi.mock('../../../src/core/design/shapes.ts', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../../src/core/design/shapes.ts')>();
  const shapes = [
    ...original.DESIGNER_SHAPES,
    {
      kind: 'movingAverage',
      parameters: [{ key: 'taps', type: 'number', range: 'whole', max: 256, presence: 'required' }],
    } as const,
  ];
  return {
    ...original,
    DESIGNER_SHAPES: shapes,
    designerShape: (k: string) => shapes.find((s) => s.kind === k),
  };
});

const { runDesigner } = await import('../../../src/core/design/index.ts');
const { magnitudeDbAt } = await import('../../../src/core/response/magnitude.ts');
const { designerSpec } = await import('../../../src/share/schema/designer.ts');
const { decodeLink, encodeLink } = await import('../../../src/share/link/index.ts');
const { emptyDesign } = await import('../../../src/core/model/design.ts');
const { runCli } = await import('../../helpers/cli.ts');
const { defaultForm, KINDS } = await import('../../../src/views/side/design/designKinds.ts');
const { readForm } = await import('../../../src/views/side/design/designForm.ts');
const { describeDesigner } = await import('../../../src/views/side/design/describe.ts');

// A description of the new kind (its type is the registry's too, once the entry is in the list).
const spec = { kind: 'movingAverage', fs: 1000, taps: 8 } as never;

describe('a new designer kind is one registry entry plus its engine function', () => {
  it('is designed and checked by the engine, errors naming its parameter', () => {
    const r = runDesigner(spec);
    if (!r.ok) throw new Error(r.error.message);
    // common practice: a moving average of N taps passes DC at 0 dB and nulls f = fs/N
    expect(magnitudeDbAt(r.value.zpk, 0)).toBeCloseTo(0, 12);
    expect(magnitudeDbAt(r.value.zpk, (2 * Math.PI) / 8)).toBeLessThan(-250);
    const bad = runDesigner({ kind: 'movingAverage', fs: 1000, taps: 2.5 } as never);
    expect(bad).toMatchObject({
      ok: false,
      error: { parameter: 'taps', message: 'taps 2.5 is not accepted' },
    });
  });

  it('is typed on the command line with its own flag, example and help line', async () => {
    const r = await runCli(['design', 'moving-average', '--fs', '1000', '--taps', '8', '--json']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).designer).toEqual(spec);
    const missing = await runCli(['design', 'moving-average', '--fs', '1000']);
    expect(missing.stderr).toMatch(
      /--taps is missing \(how many samples are averaged\)\. Example: polewright design moving-average --fs 1000 --taps 8/,
    );
    expect((await runCli(['design', '--help'])).stdout).toMatch(
      /--taps <number> +how many samples are averaged; moving-average/,
    );
  });

  it('is offered by the Design form, read from it and described', () => {
    expect(KINDS.map((k) => k.label)).toContain('Moving average');
    const r = readForm(defaultForm('movingAverage', 2000), 2000);
    expect(r).toEqual({ ok: true, spec: { kind: 'movingAverage', fs: 2000, taps: 8 } });
    expect(describeDesigner(spec)).toEqual({ title: 'Moving average', params: [['Taps', '8']] });
  });

  it('is stored in design files and links', () => {
    expect(designerSpec.parse(spec)).toEqual(spec);
    const design = { ...emptyDesign(1000), designer: spec };
    const back = decodeLink(encodeLink({ design, view: {} }));
    expect(back.ok && back.value.design.designer).toEqual(spec);
  });
});
