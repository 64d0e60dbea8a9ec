/**
 * Rewrites a path text of version 1 (e11=1% in 100) in the current words (ε11=1% over 100) on
 * read, keeping spacing, layout and comments. Stored revisions are never changed: this runs when
 * a text is opened; the next save writes the new form.
 */
import {
  componentName,
  INCREMENTS_WORD,
  VERSION1_COMPONENT_NAMES,
  VERSION1_INCREMENTS_WORD,
} from "./components";
import { tokenizeLine } from "./tokenize";

function convertLine(line: string): string {
  const { tokens } = tokenizeLine(line);
  let out = line;
  // Right to left, so earlier columns stay valid.
  for (let k = tokens.length - 1; k >= 0; k--) {
    const t = tokens[k];
    if (t.kind !== "word") continue;
    const old = VERSION1_COMPONENT_NAMES[t.text];
    const next = old
      ? componentName(old.index, old.control)
      : t.text === VERSION1_INCREMENTS_WORD
        ? INCREMENTS_WORD
        : null;
    if (next === null) continue;
    const at = t.column - 1;
    out = out.slice(0, at) + next + out.slice(at + t.text.length);
  }
  return out;
}

export function pathTextInCurrentWords(text: string): string {
  return text
    .split(/(\r?\n)/)
    .map((piece) => (piece === "\n" || piece === "\r\n" ? piece : convertLine(piece)))
    .join("");
}
