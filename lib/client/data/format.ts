// Dates and people as the workspace pages print them. Times are shown in UTC with the zone named
// so that two people in different places read the same words.

export function formatWhen(iso: string | null | undefined): string {
  if (!iso) return "—";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "—";
  return `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

export function personName(person: { name: string } | null | undefined): string {
  return person?.name ?? "former member";
}

/** A number the way a parameter table prints it: up to 4 significant digits, no trailing zeros. */
export function formatValue(value: unknown): string {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) return String(value);
    if (value === 0) return "0";
    const abs = Math.abs(value);
    if (abs >= 1e5 || abs < 1e-3) return value.toExponential(3).replace(/\.?0+e/, "e");
    return String(Number(value.toPrecision(4)));
  }
  if (value === null || value === undefined) return "—";
  if (typeof value === "string") return value;
  return JSON.stringify(value);
}
