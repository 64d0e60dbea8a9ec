/**
 * Splits one line of the path notation into tokens with their 1-based column.
 * Comments start with "#" and run to the end of the line. Words may hold Greek letters (σ11).
 */
export type TokenKind = "word" | "number" | "symbol";

export interface Token {
  kind: TokenKind;
  text: string;
  column: number;
}

const PATTERN =
  /(\s+)|(#.*$)|([A-Za-z_\u0370-\u03ff][A-Za-z0-9_\u0370-\u03ff]*)|([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)|([=,%])|(.)/g;

export interface TokenizeResult {
  tokens: Token[];
  /** Column of the first character that belongs to no token, if any. */
  badColumn: number | null;
  badChar: string | null;
}

export function tokenizeLine(line: string): TokenizeResult {
  const tokens: Token[] = [];
  PATTERN.lastIndex = 0;
  let m: RegExpExecArray | null;
  while ((m = PATTERN.exec(line)) !== null) {
    const column = m.index + 1;
    if (m[1] || m[2]) continue;
    if (m[3]) tokens.push({ kind: "word", text: m[3], column });
    else if (m[4]) tokens.push({ kind: "number", text: m[4], column });
    else if (m[5]) tokens.push({ kind: "symbol", text: m[5], column });
    else return { tokens, badColumn: column, badChar: m[6] };
  }
  return { tokens, badColumn: null, badChar: null };
}
