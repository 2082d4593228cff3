/**
 * Requirement-mask benchmark: judging a mask on the current roots, as the page does on every drag frame
 * (a pass band, a stop band and a band with both limits, MASK_GRID_POINTS each plus refinement).
 */
import type { RequirementMask } from '../src/core/mask/index.ts';
import { evaluateMask } from '../src/core/mask/index.ts';
import { benchDesign, dragSteps } from './engine.ts';
import { cell, timeMs } from './timing.ts';

/** Markdown table of evaluateMask timings (median ms) by order, moving one pole a little each call. */
export function benchMask(): string {
  const fs = 1000;
  const mask: RequirementMask = {
    regions: [
      { id: 'pass', kind: 'pass', fromHz: 0, toHz: 100, lowerDb: -1, upperDb: 1 },
      { id: 'stop', kind: 'stop', fromHz: 200, toHz: 500, upperDb: -40 },
      { id: 'band', kind: 'band', fromHz: 120, toHz: 180, lowerDb: -80, upperDb: 20 },
    ],
  };
  const rows = ['| order | regions | evaluateMask per frame (ms, median) |', '|---|---|---|'];
  for (const order of [8, 32, 64]) {
    const step = dragSteps(benchDesign(order));
    const ms = timeMs(() => evaluateMask(mask, step(), fs), 300);
    rows.push(`| ${order} | ${mask.regions.length} | ${cell(ms)} |`);
  }
  return rows.join('\n');
}

if (import.meta.url === `file://${process.argv[1]}`)
  console.log('## Requirement mask\n\n' + benchMask() + '\n');
