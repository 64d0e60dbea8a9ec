/** "crash, 23 °C ,crash" → ["crash", "23 °C"]: trimmed, no empties, no repeats. */
export function parseTags(text: string): string[] {
  return [
    ...new Set(
      text
        .split(",")
        .map((t) => t.trim())
        .filter(Boolean),
    ),
  ];
}
