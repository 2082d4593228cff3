import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** Decodes the fixture encoding: the strings 'inf', '-inf', 'nan' stand for non-finite floats. */
function revive(_key: string, v: unknown): unknown {
  if (v === 'inf') return Infinity;
  if (v === '-inf') return -Infinity;
  if (v === 'nan') return NaN;
  return v;
}

/** Loads test/reference/fixtures/<name>.json, written by test/reference/generate.py from numpy/scipy. */
export function loadFixture<T = unknown>(name: string): T {
  const url = new URL(`../reference/fixtures/${name}.json`, import.meta.url);
  return JSON.parse(readFileSync(fileURLToPath(url), 'utf8'), revive) as T;
}
