/** The FIR methods of the classical designer, as values of its family (light: the registry and the form use them). */
export const FIR_FAMILIES = ['kaiser', 'hann', 'hamming', 'blackman', 'leastsquares', 'equiripple'] as const;
export type FirFamily = (typeof FIR_FAMILIES)[number];

/** Whether a family value is one of the FIR methods. */
export function isFirFamily(family: unknown): family is FirFamily {
  return (FIR_FAMILIES as readonly unknown[]).includes(family);
}

/** Whether the family designs from pass and stop bands (rather than cut-offs). */
export function designsFromBands(family: unknown): boolean {
  return family === 'leastsquares' || family === 'equiripple';
}
