/** Upload limits of a test-curve file (issue 6): checked before and during parsing. */
export const MAX_FILE_BYTES = 10 * 1024 * 1024;
export const MAX_DATA_ROWS = 200_000;
/** A coupon curve has a handful of channels; far more means a wrong delimiter or a wrong file. */
export const MAX_COLUMNS = 64;
/** A channel name with its unit fits in a few dozen characters; a longer header cell is not one. */
export const MAX_HEADER_CELL_CHARS = 200;

/** UTF-8 size without allocating an encoded copy (runs in a worker, so no Buffer). */
export function utf8ByteLength(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c < 0xdc00) {
      bytes += 4; // surrogate pair: one 4-byte character
      i++;
    } else bytes += 3;
  }
  return bytes;
}
