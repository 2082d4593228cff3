/** The dynamic import of the exact checks, alone in a module so tests can hold it back. */
export const importExactChecks = () => import('../core/stability/exactChecks.ts');
