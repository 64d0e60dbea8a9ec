/**
 * Where the unit of a header sits: the last "[...]" or "(...)" at the end of the text, trailing
 * white space allowed. Same answer as the expression /[[(]([^\])]*)[\])]\s*$/ it replaces, found
 * in one backward pass: that expression retried every opening bracket and took time growing with
 * the square of the cell's length (16 KB of "(" held the server for a second).
 */
export interface TrailingUnit {
  /** Index of the opening "[" or "(". */
  open: number;
  /** Index of the closing "]" or ")", the last character that is not white space. */
  close: number;
}

function isCloser(ch: string): boolean {
  return ch === "]" || ch === ")";
}

function isOpener(ch: string): boolean {
  return ch === "[" || ch === "(";
}

export function findTrailingUnit(text: string): TrailingUnit | null {
  // trimEnd removes exactly the characters \s matches.
  const close = text.trimEnd().length - 1;
  if (close < 1 || !isCloser(text[close])) return null;
  // Between the opener and the closer no other closer may stand; the leftmost such opener wins.
  let open = -1;
  for (let i = close - 1; i >= 0; i--) {
    const ch = text[i];
    if (isCloser(ch)) break;
    if (isOpener(ch)) open = i;
  }
  return open < 0 ? null : { open, close };
}
