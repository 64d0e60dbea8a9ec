import { useSyncExternalStore } from "react";

// The loading desk's increment cursor lives outside the chart grid so that other panels on the
// same page (a comment pinned to an increment) can move it. One desk is mounted per page, so one
// value is enough; the chart grid clears it when it goes away, and a new page starts with none.

type Listener = () => void;

let current: number | null = null;
const listeners = new Set<Listener>();

export function getIncrementCursor(): number | null {
  return current;
}

export function setIncrementCursor(increment: number | null): void {
  const next = increment === null ? null : Math.max(0, Math.round(increment));
  if (next === current) return;
  current = next;
  for (const listener of listeners) listener();
}

function subscribe(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The cursor's increment (null when hidden) and the setter every chart and panel shares. */
export function useIncrementCursor(): [number | null, (increment: number | null) => void] {
  const value = useSyncExternalStore(subscribe, getIncrementCursor, () => null);
  return [value, setIncrementCursor];
}
