/**
 * A small, documented hook for the speed bench and the browser test (no effect on users):
 *   window.__craquelure.events: { name, t, detail }[]   t = performance.now() in ms
 *   each event is also a performance mark "craquelure:<name>".
 * Events: "edit" (a parameter or path change accepted, detail.gen = run generation it starts),
 * "run-start", "run-done" (detail.scope = the worker's global scope), "run-error",
 * "chart-drawn" (detail.chart, detail.gen, detail.complete = every set of that generation done).
 */
export interface LoadingDeskEvent {
  name: string;
  t: number;
  detail: Record<string, unknown>;
}

interface Probe {
  events: LoadingDeskEvent[];
}

const MAX_EVENTS = 5000;

function probe(): Probe | null {
  if (typeof window === "undefined") return null;
  const w = window as unknown as { __craquelure?: Probe };
  w.__craquelure ??= { events: [] };
  return w.__craquelure;
}

export function emitEvent(name: string, detail: Record<string, unknown> = {}): void {
  const p = probe();
  if (!p) return;
  const t = performance.now();
  if (p.events.length >= MAX_EVENTS) p.events.splice(0, p.events.length - MAX_EVENTS + 1);
  p.events.push({ name, t, detail });
  try {
    performance.mark(`craquelure:${name}`, { detail });
  } catch {
    // marks with un-clonable details are optional
  }
}
