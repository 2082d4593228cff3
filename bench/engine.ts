/**
 * Engine benchmarks: frequency response by order and points, and the full recompute one drag step
 * triggers (roots → coefficients and sections → response at 2048 points → 1024-sample impulse response).
 */
import type { Root, Zpk } from '../src/core/types.ts';
import { zpkToTf, zpkToSections } from '../src/core/system/index.ts';
import { frequencyGrid, responseZpk } from '../src/core/response/index.ts';
import { stabilityOfZpk } from '../src/core/stability/index.ts';
import { filterSections } from '../src/core/time/filter.ts';
import { makeImpulse } from '../src/core/time/inputs.ts';
import { cell, timeMs } from './timing.ts';

/** A stable design of the given (even) order: conjugate pole pairs inside the circle, zero pairs on it. */
export function benchDesign(order: number): Zpk {
  const pairs = order / 2;
  const zeros: Root[] = [];
  const poles: Root[] = [];
  for (let k = 0; k < pairs; k++) {
    const w = (Math.PI * (k + 0.5)) / pairs;
    zeros.push({ re: Math.cos(w), im: Math.sin(w), multiplicity: 1 });
    poles.push({ re: 0.95 * Math.cos(w * 0.9), im: 0.95 * Math.sin(w * 0.9), multiplicity: 1 });
  }
  return { zeros, poles, gain: 1 };
}

/** Returns `base` with its first pole moved a little (under 1e-3) on each call, as a drag does, so nothing is cached. */
export function dragSteps(base: Zpk): () => Zpk {
  let t = 0;
  return () => {
    t += 1e-4;
    const poles = base.poles.slice();
    const p0 = poles[0]!;
    poles[0] = { ...p0, re: p0.re + Math.sin(t) * 1e-3 };
    return { ...base, poles };
  };
}

/** One drag step's recompute: what the page derives from a moved root. */
export function dragRecompute(zpk: Zpk, grid: Float64Array, impulse: Float64Array): number {
  const tf = zpkToTf(zpk);
  const sections = zpkToSections(zpk);
  const r = responseZpk(zpk, grid);
  const s = stabilityOfZpk(zpk);
  const h = filterSections(sections, impulse);
  return tf.a.length + r.magnitude[1]! + s.maxPoleRadius + h[10]!;
}

/** Markdown table of response timings (median ms) for orders × point counts. */
export function benchResponse(): string {
  const orders = [2, 8, 16, 32, 64];
  const points = [512, 2048, 8192, 65536];
  const rows = [
    `| order | ${points.map((p) => `${p} pts (ms)`).join(' | ')} |`,
    `|---|${points.map(() => '---').join('|')}|`,
  ];
  for (const order of orders) {
    const zpk = benchDesign(order);
    const cells = points.map((n) => {
      const grid = frequencyGrid(n);
      return cell(timeMs(() => responseZpk(zpk, grid), 150));
    });
    rows.push(`| ${order} | ${cells.join(' | ')} |`);
  }
  return rows.join('\n');
}

/** Markdown table of the drag-step recompute at orders 8, 32 and 128 (median ms). */
export function benchDragRecompute(): string {
  const grid = frequencyGrid(2048);
  const impulse = makeImpulse(1024);
  const rows = ['| order | recompute per drag step (ms, median) |', '|---|---|'];
  for (const order of [8, 32, 128]) {
    const step = dragSteps(benchDesign(order));
    const ms = timeMs(() => dragRecompute(step(), grid, impulse), 300);
    rows.push(`| ${order} | ${cell(ms)} |`);
  }
  return rows.join('\n');
}

if (import.meta.url === `file://${process.argv[1]}`) {
  console.log('## Frequency response\n\n' + benchResponse() + '\n');
  console.log('## Drag-step recompute\n\n' + benchDragRecompute() + '\n');
}
