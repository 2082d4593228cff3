import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const coreDir = fileURLToPath(new URL('../../src/core', import.meta.url));
const FORBIDDEN =
  /from\s+['"](react|react-dom|zustand|d3[\w-]*|node:[\w/]+|fs|path|os|child_process)(\/[^'"]*)?['"]|from\s+['"][./]*\/(store|views|cli|share)\//;

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('src/core is pure', () => {
  it('no file in src/core imports React, the DOM libraries, the store or Node', () => {
    const offenders = files(coreDir).filter((f) => FORBIDDEN.test(readFileSync(f, 'utf8')));
    expect(offenders).toEqual([]);
  });
  it('no file in src/core touches window, document or process', () => {
    const offenders = files(coreDir).filter((f) =>
      /\b(window|document|process)\.\w/.test(
        readFileSync(f, 'utf8').replace(/\/\/.*$|\/\*[\s\S]*?\*\//gm, ''),
      ),
    );
    expect(offenders).toEqual([]);
  });
});
