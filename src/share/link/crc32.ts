/**
 * CRC-32 as in ISO-HDLC, Ethernet, zip and PNG: polynomial 0x04C11DB7 processed bit-reflected (0xEDB88320),
 * register preset to 0xFFFFFFFF, result inverted; its check value for the ASCII bytes "123456789" is
 * 0xCBF43926. It finds every change of up to 32 adjacent bits and every odd number of flipped bits, and
 * lets a random change pass with probability 2⁻³².
 */

const TABLE = new Uint32Array(256);
for (let n = 0; n < 256; n++) {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  TABLE[n] = c >>> 0;
}

/** The CRC-32 of the bytes, as an unsigned 32-bit number. */
export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (let i = 0; i < bytes.length; i++) c = TABLE[(c ^ bytes[i]!) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
