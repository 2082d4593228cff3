/**
 * What the page's first view needs of the designers, and no more (every module a first-view module
 * imports is built into the first view, vite.config.ts): the door that runs a description through the
 * installed engine (door.ts; DesignEnginePending until engine.ts has arrived), the shapes of the registry's entries
 * for the checks of the file readers (shapes.ts), and the engine slot. index.ts is the whole engine, installed.
 */
export { runDesigner } from './door.ts';
export type { DesignerSpec, DesignResult } from './spec.ts';
export { designerShape, type DesignerShape, type ParameterShape } from './shapes.ts';
export { orderMax } from './parameters.ts';
export { DesignEnginePending, designEngine, designEngineReady, installDesignEngine } from './engineSlot.ts';
