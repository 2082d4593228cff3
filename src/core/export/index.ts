/** Exports of an implementation as text (C header, JSON, CSV), each stating its conventions and design hash. */
export { exportC } from './c.ts';
export type { CExportOptions } from './c.ts';
export { exportJson } from './json.ts';
export { exportCsv } from './csv.ts';
export { conventionLines, structureName } from './conventions.ts';
export { designHash, fnv1a64, canonicalJson } from './hash.ts';
export { float17, cInteger } from './numbers.ts';
export { noiseLines, noiseJson, NOISE_MODEL } from './noise.ts';
export { exportWarnings, warningLine } from './warnings.ts';
export type { ExportWarning, ExportWarningKey } from './warnings.ts';
export { exportFirC, firConventionLines, firHash } from './firC.ts';
export { exportFirJson, exportFirCsv } from './firText.ts';
export { firExportWarnings } from './firWarnings.ts';
