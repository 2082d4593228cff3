/**
 * Zod schema of the designer that produced a design (DesignerSpec in src/core/design), kept with the design.
 * It is built from the designer registry: every kind with its parameters, their choices and list limits;
 * numbers are only bounded here, runDesigner checks their sense.
 */
import { z } from 'zod';
import {
  DESIGNERS,
  orderMax,
  type DesignerEntry,
  type DesignerSpec,
  type OrderParameter,
  type Parameter,
} from '../../core/design/index.ts';
import { MAX_WHOLE_ITEM } from '../../core/model/limits.ts';
import { finite } from './common.ts';

function valueSchema(p: Parameter): z.ZodType {
  switch (p.type) {
    case 'number':
      return p.range === 'whole'
        ? z
            .number()
            .int()
            .min(1)
            .max(p.max ?? MAX_WHOLE_ITEM)
        : finite;
    case 'order':
      return z.union([z.number().int().min(1).max(p.max), z.literal('auto')]);
    case 'list':
      return p.item === 'band'
        ? z.array(finite).min(1).max(p.count.max)
        : z.array(z.number().int().min(1).max(MAX_WHOLE_ITEM)).max(p.count.max);
    case 'choice':
      return z.enum(p.options.map((o) => o.value) as [string, ...string[]]);
  }
}

function entrySchema(entry: DesignerEntry) {
  const shape: Record<string, z.ZodType> = { kind: z.literal(entry.kind), fs: finite };
  for (const p of entry.parameters) {
    const v = valueSchema(p);
    shape[p.key] = p.presence === 'required' ? v : v.exactOptional();
  }
  const orders = entry.parameters.filter((p) => p.type === 'order' && p.maxFor);
  if (orders.length === 0) return z.object(shape);
  // an order within the parameter's bound may still be above the bound for these values (an IIR family)
  return z.object(shape).superRefine((values, ctx) => {
    for (const p of orders) {
      const v = values[p.key];
      const max = orderMax(p as OrderParameter, values);
      if (typeof v === 'number' && v > max)
        ctx.addIssue({
          code: 'custom',
          path: [p.key],
          message: `order ${v} is above ${max} for these values`,
        });
    }
  });
}

const entries = (DESIGNERS as readonly DesignerEntry[]).map(entrySchema);

/** Every designer kind of the registry with its parameters. */
export const designerSpec = z.discriminatedUnion(
  'kind',
  entries as unknown as [ReturnType<typeof entrySchema>, ...ReturnType<typeof entrySchema>[]],
) as unknown as z.ZodType<DesignerSpec>;
