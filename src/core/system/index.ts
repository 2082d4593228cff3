/** System representations: zeros/poles/gain, b/a and second-order sections, and conversions between them. */
export { expandRoots, compressRoots, rootCount, systemOrder, ROOT_MERGE_TOLERANCE } from './rootList.ts';
export { zpkToTf } from './transferFunction.ts';
export { zpkToSections } from './sections.ts';
export type { SectionPairing } from './sections.ts';
export { sectionsToTf, sectionsToZpk, quadraticRoots } from './sectionsConvert.ts';
