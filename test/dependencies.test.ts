import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

const ROOT = fileURLToPath(new URL('..', import.meta.url));

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? sources(join(dir, e.name)) : /\.(ts|tsx)$/.test(e.name) ? [join(dir, e.name)] : [],
  );
}

/** Package names of the imports that exist at run time (static, side-effect and dynamic) in src/. */
function importedPackages(): Set<string> {
  const found = new Set<string>();
  const add = (spec: string) => {
    if (spec.startsWith('.') || spec.startsWith('/') || spec.startsWith('node:')) return;
    const parts = spec.split('/');
    found.add(spec.startsWith('@') ? parts.slice(0, 2).join('/') : parts[0]!);
  };
  for (const file of sources(join(ROOT, 'src'))) {
    const text = readFileSync(file, 'utf8');
    if (!/\b(from|import)\s*\(?\s*['"](?![./]|node:)/.test(text)) continue; // only relative imports: skip parsing
    const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
    const visit = (node: ts.Node): void => {
      if (ts.isImportDeclaration(node) && !node.importClause?.isTypeOnly) {
        add((node.moduleSpecifier as ts.StringLiteral).text);
      } else if (ts.isExportDeclaration(node) && node.moduleSpecifier && !node.isTypeOnly) {
        add((node.moduleSpecifier as ts.StringLiteral).text);
      } else if (
        ts.isCallExpression(node) &&
        node.expression.kind === ts.SyntaxKind.ImportKeyword &&
        ts.isStringLiteral(node.arguments[0]!)
      ) {
        add(node.arguments[0].text);
      }
      ts.forEachChild(node, visit);
    };
    visit(source);
  }
  return found;
}

describe('runtime dependencies', () => {
  it('are exactly the packages src/ imports (npm ls --omit=dev lists nothing unused)', () => {
    const pkg = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as {
      dependencies: Record<string, string>;
    };
    const imported = importedPackages();
    expect([...imported.keys()].sort()).toEqual(Object.keys(pkg.dependencies).sort());
  });
});
