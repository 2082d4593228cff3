/** Design links: encode a design into a URL fragment and read one back. */
export {
  ALTERED_LINK_MESSAGE,
  LINK_FORMAT,
  LINK_PREFIX,
  UNCHECKED_LINK_NOTE,
  decodeLink,
  encodeLink,
  linkFragment,
  linkUrl,
} from './codec.ts';
