/** Design links: encode a design into a URL fragment and read one back. */
export { LINK_FORMAT, LINK_PREFIX, decodeLink, encodeLink, linkFragment, linkUrl } from './codec.ts';
