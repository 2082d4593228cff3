/**
 * The uncertain roots of a diagnosis (diagnostics.ts), alone in a module: the page's first view lists them,
 * while the diagnosis itself loads after the first paint (core/stability/exactChecks.ts).
 */
import type { RootDiagnostic } from '../roots/diagnostics.ts';
import type { SystemDiagnostics } from './diagnostics.ts';

/** The uncertain roots of a diagnosis, zeros then poles, with what they are. */
export function uncertainRoots(d: SystemDiagnostics): { kind: 'zero' | 'pole'; root: RootDiagnostic }[] {
  return [
    ...d.zeros.filter((r) => r.uncertain).map((root) => ({ kind: 'zero' as const, root })),
    ...d.poles.filter((r) => r.uncertain).map((root) => ({ kind: 'pole' as const, root })),
  ];
}
