/**
 * Text as a CSS string literal that nothing can break out of: every character other than a
 * letter, digit or space becomes a CSS escape (`\3c ` for `<`), so a scenario named
 * `</style><script>` stays text inside a <style> element and inside `content: "…"`.
 */
export function cssString(text: string): string {
  let out = '"';
  for (const ch of text.replace(/[\r\n\t]+/g, " ")) {
    out += /^[A-Za-z0-9 ]$/.test(ch) ? ch : `\\${ch.codePointAt(0)!.toString(16)} `;
  }
  return `${out}"`;
}
