/**
 * The first view checks designer descriptions against the registry's shapes (shapes.ts) instead of its
 * full entries: every shape must say exactly what its entry says of the parameters it checks.
 */
import { describe, expect, it } from 'vitest';
import { DESIGNERS } from '../../../src/core/design/registry.ts';
import { DESIGNER_SHAPES, designerShape } from '../../../src/core/design/shapes.ts';
import type { DesignerEntry, Parameter } from '../../../src/core/design/parameters.ts';
import { orderMax } from '../../../src/core/design/parameters.ts';

/** What the checks read of a parameter (functions aside: maxFor is compared by its values below). */
function checked(p: Parameter) {
  const base = { key: p.key, type: p.type, presence: p.presence };
  switch (p.type) {
    case 'number':
      return { ...base, range: p.range, ...(p.max !== undefined && { max: p.max }) };
    case 'order':
      return { ...base, max: p.max, maxFor: p.maxFor !== undefined };
    case 'list':
      return { ...base, item: p.item, count: { max: p.count.max } };
    case 'choice':
      return { ...base, options: p.options.map((o) => ({ value: o.value })) };
  }
}

const entries = DESIGNERS as readonly DesignerEntry[];

describe('the designer shapes of the first view', () => {
  it('list every kind of the registry, in its order, and no other', () => {
    expect(DESIGNER_SHAPES.map((s) => s.kind)).toEqual(entries.map((e) => e.kind));
  });

  it.each(entries.map((e) => [e.kind, e] as const))(
    '%s: parameters and alternatives as its entry',
    (kind, e) => {
      const shape = designerShape(kind)!;
      const shaped = shape.parameters.map((p) =>
        p.type === 'order' ? { ...p, maxFor: p.maxFor !== undefined } : { ...p },
      );
      expect(shaped).toEqual(e.parameters.map(checked));
      expect(shape.alternatives?.map((a) => a.keys) ?? []).toEqual(e.alternatives?.map((a) => a.keys) ?? []);
    },
  );

  it("an order's largest value is the entry's for every choice of the others", () => {
    for (const e of entries)
      for (const p of e.parameters) {
        if (p.type !== 'order') continue;
        const shape = designerShape(e.kind)!.parameters.find((q) => q.key === p.key)!;
        const choices = e.parameters.filter((q) => q.type === 'choice');
        const combos = choices.reduce<Record<string, unknown>[]>(
          (acc, c) => acc.flatMap((v) => c.options.map((o) => ({ ...v, [c.key]: o.value }))),
          [{}],
        );
        for (const values of combos)
          expect(orderMax(shape as never, values), `${e.kind} ${JSON.stringify(values)}`).toBe(
            orderMax(p, values),
          );
      }
  });
});
