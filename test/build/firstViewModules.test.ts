/**
 * What stays out of the page's first view (DEVELOPERS.md, "What the page loads first"): the build puts every
 * module the entry imports statically into it (vite.config.ts), so one static import of a heavy module from
 * a first-view module brings it back, often under the budget and unnoticed. This walks the static imports
 * from src/main.tsx, as the build does (type-only imports are erased, dynamic imports start later chunks).
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const srcDir = fileURLToPath(new URL('../../src', import.meta.url));

/** Relative specifiers a file imports or re-exports at run time. */
function staticImports(text: string): string[] {
  const code = text.replace(/\/\*[\s\S]*?\*\/|(^|[^:])\/\/.*$/gm, '$1');
  const out: string[] = [];
  const re =
    /(?:^|[;\n])\s*(import|export)\s+([^;'"]*?)\s*from\s*(['"])(\.{1,2}\/[^'"]+)\3|(?:^|[;\n])\s*import\s*(['"])(\.{1,2}\/[^'"]+)\5/g;
  for (const m of code.matchAll(re)) {
    if (m[6]) {
      out.push(m[6]);
      continue;
    }
    const clause = m[2]!.trim();
    if (/^type\b/.test(clause)) continue; // import type / export type
    // `import { type A } from` stays as a side-effect import under verbatimModuleSyntax: counted.
    out.push(m[4]!);
  }
  return out;
}

/** Every module reached from the entry by static imports, as paths relative to src/. */
function firstViewModules(): Set<string> {
  const seen = new Set<string>();
  const stack = [resolve(srcDir, 'main.tsx')];
  while (stack.length > 0) {
    const file = stack.pop()!;
    const rel = relative(srcDir, file);
    if (seen.has(rel)) continue;
    seen.add(rel);
    if (!/\.tsx?$/.test(file)) continue;
    for (const spec of staticImports(readFileSync(file, 'utf8'))) {
      const target = resolve(dirname(file), spec);
      if (existsSync(target)) stack.push(target);
    }
  }
  return seen;
}

describe('the first view', () => {
  const modules = firstViewModules();

  it('is found by the walk: the shell, the store, the designer shapes and the exact checks slot', () => {
    for (const m of [
      'views/App.tsx',
      'store/store.ts',
      'core/design/shapes.ts',
      'core/stability/exactChecksSlot.ts',
      'core/stability/index.ts',
    ])
      expect(modules, m).toContain(m);
  });

  it('leaves out the exact checks, the root finder, the designer registry and the FIR taps arithmetic, which load after it', () => {
    const later = [...modules].filter(
      (m) =>
        m.startsWith('core/roots/') ||
        m.startsWith('core/design/entries/') ||
        [
          'core/stability/exactChecks.ts',
          'core/stability/typed.ts',
          'core/stability/coefficients.ts',
          'core/system/expandedCheck.ts',
          'core/system/diagnostics.ts',
          'core/system/fromCoefficients.ts',
          'core/time/fromCoefficients.ts',
          'core/time/poleSearch.ts',
          'core/design/registry.ts',
          'core/design/engine.ts',
          'core/design/index.ts',
          // an FIR's taps and their zeros (the Target page, the quantized taps on the plane and plots)
          'core/fixed/fir.ts',
          'core/fixed/firQuantized.ts',
          'store/firDerived.ts',
          'store/firQuantizedDerived.ts',
          'views/firQuantized/FirQuantizedViews.tsx',
          // the worker that finds a long tap set's zeros, and the page's side of it
          'views/firQuantized/tapZerosFinder.ts',
          'workers/tapZerosJob.ts',
          'workers/tapZeros.worker.ts',
        ].includes(m),
    );
    expect(later).toEqual([]);
  });
});
