/**
 * Delimiter of a test-curve file: tab, semicolon or comma. A parser's generic guess can pick the
 * comma in "0,0123;45,6" (decimal commas split every row evenly), so the European convention is
 * applied first: a tab or semicolon present on every sampled line wins over the comma.
 */
export type Delimiter = "," | ";" | "\t";

const SAMPLE_LINES = 20;

export function detectDelimiter(text: string): Delimiter {
  const lines: string[] = [];
  let start = 0;
  while (lines.length < SAMPLE_LINES && start < text.length) {
    let end = text.indexOf("\n", start);
    if (end < 0) end = text.length;
    const line = text.slice(start, Math.min(end, start + 10_000)).trim();
    if (line !== "") lines.push(line);
    start = end + 1;
  }
  if (lines.length === 0) return ",";
  for (const candidate of ["\t", ";"] as const) {
    if (lines.every((line) => line.includes(candidate))) return candidate;
  }
  return ",";
}
