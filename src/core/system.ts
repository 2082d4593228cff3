/** System representations: zeros/poles/gain, b/a and second-order sections, and conversions between them. */
export {
  expandRoots,
  compressRoots,
  rootCount,
  systemOrder,
  ROOT_MERGE_TOLERANCE,
} from './system/rootList.ts';
export { zpkToTf, tfToZpk, polyRoots } from './system/transferFunction.ts';
export { zpkToSections } from './system/sections.ts';
export type { SectionPairing } from './system/sections.ts';
export { sectionsToTf, sectionsToZpk, quadraticRoots } from './system/sectionsConvert.ts';
