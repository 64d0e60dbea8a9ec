/** Download names that say what is inside: scenario, set, chart and the date. */
export function slug(text: string): string {
  const s = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 48);
  return s || "untitled";
}

function stamp(date: Date): string {
  return date.toISOString().slice(0, 10);
}

export function scenarioFileName(name: string, date = new Date()): string {
  return `craquelure-${slug(name)}-${stamp(date)}.scenario.json`;
}

export function resultsCsvName(name: string, setLabel: string | null, date = new Date()): string {
  const which = setLabel === null ? "all-sets" : `set-${slug(setLabel)}`;
  return `craquelure-${slug(name)}-${which}-${stamp(date)}.csv`;
}

export function chartImageName(name: string, chart: string, date = new Date()): string {
  return `craquelure-${slug(name)}-${slug(chart)}-${stamp(date)}`;
}
