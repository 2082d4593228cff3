/**
 * The heavy design algorithms (core/design/engine.ts) are not in the page's first view: they load after
 * the first paint (views/prefetch.ts) or when something needs them first, the same way as the link codec
 * (persist.ts); the Design page imports them with its code, so its form always has them. A store action
 * that runs a designer before they arrived waits for them (whenDesignEngine).
 */
import { DesignEnginePending, designEngineReady, installDesignEngine } from '../core/design/light.ts';
import { importDesignEngine } from './designEngineImport.ts';

let loading: Promise<typeof import('../core/design/engine.ts')> | null = null;

/** Loads and installs the design engine (fetched once; a failed fetch is retried by the next call). */
export function loadDesignEngine(): Promise<void> {
  if (designEngineReady()) return Promise.resolve();
  return (loading ??= importDesignEngine().catch((e: unknown) => {
    loading = null;
    throw e;
  })).then((m) => installDesignEngine(m.DESIGN_ENGINE));
}

/**
 * Runs f now, or, when it needs the design engine and that has not arrived, once it has (a promise of
 * f's value; rejected when the engine cannot be fetched).
 */
export function whenDesignEngine<T>(f: () => T): T | Promise<T> {
  try {
    return f();
  } catch (e) {
    if (!(e instanceof DesignEnginePending)) throw e;
    return loadDesignEngine().then(f);
  }
}
