/** The dynamic import of the design algorithms, alone in a module so tests can hold it back. */
export const importDesignEngine = () => import('../core/design/engine.ts');
