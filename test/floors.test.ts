import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The top-level folders of src/ are floors, and imports run one way only: down. views → store → share →
 * core, cli → share → core, workers → core (the page starts the worker, so views may name it). Within a
 * folder anything goes; src/main.tsx is the page's entry and wires views to the store.
 */
const MAY_IMPORT: Record<string, readonly string[]> = {
  core: [],
  share: ['core'],
  store: ['share', 'core'],
  workers: ['core'],
  views: ['store', 'share', 'core', 'workers'],
  cli: ['share', 'core'],
  '.': ['views', 'store'],
};

const srcDir = fileURLToPath(new URL('../src', import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? sourceFiles(p) : /\.tsx?$/.test(p) ? [p] : [];
  });
}

/** The floor of a path inside src/ ('.' for a file directly in src/), or null outside src/. */
function floorOf(path: string): string | null {
  const rel = relative(srcDir, path);
  if (rel.startsWith('..')) return null;
  const parts = rel.split(sep);
  return parts.length === 1 ? '.' : parts[0]!;
}

/** Relative module specifiers of a file: static and dynamic imports, re-exports, and worker URLs. */
function specifiers(text: string): string[] {
  const code = text.replace(/\/\*[\s\S]*?\*\/|(^|[^:])\/\/.*$/gm, '$1');
  const re = /(?:\bfrom\s*|\bimport\s*\(\s*|\bimport\s+|new URL\(\s*)(['"])(\.{1,2}\/[^'"]+)\1/g;
  return [...code.matchAll(re)].map((m) => m[2]!);
}

interface Edge {
  from: string;
  to: string;
}

/** Imports that run against the floors: a file of one floor naming a file of a floor it may not use. */
function upwardEdges(edges: readonly Edge[]): Edge[] {
  return edges.filter(({ from, to }) => {
    const a = floorOf(from);
    const b = floorOf(to);
    if (a === null || b === null || a === b) return b === null && a !== null;
    const allowed = MAY_IMPORT[a];
    return !allowed || !allowed.includes(b);
  });
}

function edgesOfTree(): Edge[] {
  return sourceFiles(srcDir).flatMap((from) =>
    specifiers(readFileSync(from, 'utf8')).map((s) => ({ from, to: resolve(dirname(from), s) })),
  );
}

const at = (p: string) => join(srcDir, p);

describe('floors of src/', () => {
  it('finds every kind of import a file can make', () => {
    const text = [
      "import type { A } from '../store/a.ts';",
      "export { b } from './b.ts';",
      "import './c.css';",
      "const w = new Worker(new URL('../workers/w.ts', import.meta.url));",
      "const m = await import('../share/m.ts');",
      "// import { x } from '../views/x.ts';",
      "const s = 'https://example.org/../views/y.ts';",
    ].join('\n');
    expect(specifiers(text)).toEqual([
      '../store/a.ts',
      './b.ts',
      './c.css',
      '../workers/w.ts',
      '../share/m.ts',
    ]);
  });

  it('flags an import that runs up or sideways, and allows the ones that run down', () => {
    const up: Edge[] = [
      { from: at('share/document.ts'), to: at('store/design.ts') },
      { from: at('core/x.ts'), to: at('share/y.ts') },
      { from: at('cli/main.ts'), to: at('store/store.ts') },
      { from: at('workers/w.ts'), to: at('share/y.ts') },
      { from: at('store/s.ts'), to: at('views/v.tsx') },
      { from: at('core/x.ts'), to: resolve(srcDir, '../build/csp.ts') },
    ];
    const down: Edge[] = [
      { from: at('views/v.tsx'), to: at('store/s.ts') },
      { from: at('views/v.tsx'), to: at('workers/w.ts') },
      { from: at('store/s.ts'), to: at('core/model/design.ts') },
      { from: at('cli/main.ts'), to: at('share/designFile.ts') },
      { from: at('core/a/x.ts'), to: at('core/b/y.ts') },
      { from: at('main.tsx'), to: at('views/App.tsx') },
    ];
    expect(upwardEdges([...up, ...down])).toEqual(up);
  });

  it('every import in src/ runs down the floors (views → store → share → core, cli → share → core, workers → core)', () => {
    const edges = edgesOfTree();
    expect(edges.length).toBeGreaterThan(500);
    const show = (e: Edge) => `${relative(srcDir, e.from)} → ${relative(srcDir, e.to)}`;
    expect(upwardEdges(edges).map(show)).toEqual([]);
  });
});
