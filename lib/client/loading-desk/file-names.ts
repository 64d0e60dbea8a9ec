/**
 * Download names that say what is inside: scenario, set, chart and the date. The quantities keep
 * their symbols (σ11, ε11, γ12: "σ11-against-ε11"), so a folder of exports reads like the
 * charts; Chromium, Firefox and Safari take UTF-8 in an anchor's `download` name.
 */
export function slug(text: string): string {
  const s = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, "-")
    .replace(/^-+|-+$/g, "");
  // Cut by code point so a symbol is never split in half.
  const cut = Array.from(s).slice(0, 48).join("").replace(/-+$/, "");
  return cut || "untitled";
}

function stamp(date: Date): string {
  return date.toISOString().slice(0, 10);
}

export function scenarioFileName(name: string, date = new Date()): string {
  return `craquelure-${slug(name)}-${stamp(date)}.scenario.json`;
}

function resultsBase(name: string, setLabel: string | null, date: Date): string {
  const which = setLabel === null ? "all-sets" : `set-${slug(setLabel)}`;
  return `craquelure-${slug(name)}-${which}-${stamp(date)}`;
}

export function resultsCsvName(name: string, setLabel: string | null, date = new Date()): string {
  return `${resultsBase(name, setLabel, date)}.csv`;
}

/** The side file of a results CSV: same name, so the two sort together. */
export function provenanceName(name: string, setLabel: string | null, date = new Date()): string {
  return `${resultsBase(name, setLabel, date)}.provenance.json`;
}

export function chartImageName(name: string, chart: string, date = new Date()): string {
  return `craquelure-${slug(name)}-${slug(chart)}-${stamp(date)}`;
}
