/** Trace colours of the parameter sets, in the order sets are added; readable on glaze. */
export const SET_COLORS = [
  "#b4532a",
  "#2f7a74",
  "#5b4a9e",
  "#c08a12",
  "#1f5fa8",
  "#8a2f5a",
] as const;

export const MAX_SETS = SET_COLORS.length;

/** First colour not yet used by another set. */
export function nextColor(used: readonly string[]): string {
  return SET_COLORS.find((c) => !used.includes(c)) ?? SET_COLORS[used.length % SET_COLORS.length];
}
