/**
 * The light door to the designers (what the page's first view imports): it runs a description through
 * the installed engine (engineSlot.ts), whose runDesigner (runDesigner.ts) checks the parameters, designs
 * and refuses roots double precision cannot keep apart. Before the engine is installed it throws
 * DesignEnginePending.
 */
import type { Result } from '../types.ts';
import type { DesignResult } from './result.ts';
import type { DesignerSpec } from './spec.ts';
import { designEngine } from './engineSlot.ts';

/** Runs a designer description (runDesigner.ts) through the installed engine. */
export function runDesigner(spec: DesignerSpec): Result<DesignResult> {
  return designEngine().run(spec);
}
