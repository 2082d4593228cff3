/** The page's number formatting is the engine's one rule for read-outs (core/format.ts). */
export * from '../../core/format.ts';
