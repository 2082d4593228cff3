/**
 * Where the registry finds the heavy design algorithms (the door that checks a description's parameters,
 * IIR prototypes, elliptic functions, FIR window, least squares and equiripple, order estimation): engine.ts. The registry entries stay light (parameters,
 * checks, examples), so the page's first view carries them without the algorithms; the page installs the
 * engine when its chunk arrives (store/designEngine.ts), the command line and the tests at start (index.ts
 * installs it on import). A design run before then throws DesignEnginePending, which runDesigner lets
 * through: the caller waits for the engine and runs again.
 */
import type { Result } from '../types.ts';
import type { DesignResult } from './result.ts';
import type { DesignerSpec } from './spec.ts';
import type { IirSpec } from './entries/classicalParameters.ts';
import type { designComb, designHarmonicNotches } from './comb.ts';
import type { designDcBlocker, designNotch, designPeak } from './notch.ts';
import type { designPeakingEq, designShelf } from './equaliser.ts';
import type { linearPhaseShape, moveKeepingLinearPhase, restoreLinearPhase } from './fir/linearPhaseEdit.ts';
import type { moveDesignKeepingLinearPhase, restoreLinearPhaseDesign } from './fir/linearPhaseDesign.ts';

export interface DesignEngine {
  /** The door: checks a description against its registry entry, designs, refuses roots that merge. */
  run(spec: DesignerSpec): Result<DesignResult>;
  /** The classical designer: an IIR family or an FIR method. */
  classical(spec: IirSpec): DesignResult;
  differentiator(spec: { kind: 'differentiator'; fs: number; order: number; upToHz: number }): DesignResult;
  hilbert(spec: { kind: 'hilbert'; fs: number; order: number; bandHz: readonly number[] }): DesignResult;
  /** The small designers' roots (notch.ts, comb.ts, equaliser.ts), which their registry entries call. */
  designNotch: typeof designNotch;
  designPeak: typeof designPeak;
  designDcBlocker: typeof designDcBlocker;
  designHarmonicNotches: typeof designHarmonicNotches;
  designComb: typeof designComb;
  designPeakingEq: typeof designPeakingEq;
  designShelf: typeof designShelf;
  /** Hand edits that keep an FIR linear phase (fir/linearPhaseEdit.ts). */
  linearPhaseShape: typeof linearPhaseShape;
  moveKeepingLinearPhase: typeof moveKeepingLinearPhase;
  restoreLinearPhase: typeof restoreLinearPhase;
  moveDesignKeepingLinearPhase: typeof moveDesignKeepingLinearPhase;
  restoreLinearPhaseDesign: typeof restoreLinearPhaseDesign;
}

/** Thrown by a design that needs the engine before it is installed. */
export class DesignEnginePending extends Error {
  constructor() {
    super('the design algorithms have not loaded yet');
    this.name = 'DesignEnginePending';
  }
}

let installed: DesignEngine | null = null;

/** Installs the engine (null removes it, for tests of the page's loading path). */
export function installDesignEngine(engine: DesignEngine | null): void {
  installed = engine;
}

/** Whether the engine is installed. */
export function designEngineReady(): boolean {
  return installed !== null;
}

/** The installed engine; throws DesignEnginePending when there is none yet. */
export function designEngine(): DesignEngine {
  if (!installed) throw new DesignEnginePending();
  return installed;
}
