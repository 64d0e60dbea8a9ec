/** How deep objects and arrays may nest in any JSON we read; real files stay below 10. */
const MAX_JSON_DEPTH = 64;

export interface TooDeep {
  line: number;
  column: number;
}

/**
 * Where the text first nests deeper than `max` objects/arrays, or null. A linear scan of the
 * raw text before parsing: the checks that walk a parsed value recursively would otherwise
 * overflow the stack on a file nested thousands of levels deep (a 500 instead of a 400).
 */
export function findTooDeep(text: string, max = MAX_JSON_DEPTH): TooDeep | null {
  let depth = 0;
  let inString = false;
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: the next character is escaped
      else if (c === 0x22) inString = false;
      continue;
    }
    if (c === 0x22) inString = true;
    else if (c === 0x0a) {
      line++;
      lineStart = i + 1;
    } else if (c === 0x7b || c === 0x5b) {
      if (++depth > max) return { line, column: i - lineStart + 1 };
    } else if (c === 0x7d || c === 0x5d) depth--;
  }
  return null;
}

/** The message for a too-deep file, in the user's words. */
export function tooDeepMessage(at: TooDeep, max = MAX_JSON_DEPTH): string {
  return `The JSON nests more than ${max} levels deep (line ${at.line}, column ${at.column}); flatten it.`;
}
