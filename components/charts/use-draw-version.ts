"use client";

import { useEffect, useState } from "react";
import { flushSync } from "react-dom";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import { enqueueDraw } from "./draw-queue";

/** Least time between two redraws of one chart while a run is still streaming in. */
const MIN_INTERVAL_MS = 70;

/**
 * The store version a chart should draw: follows the store, at most one redraw per
 * MIN_INTERVAL_MS while computing, always the final state, each redraw in its own task.
 */
export function useDrawVersion(store: ResultsStore): number {
  const [version, setVersion] = useState(store.version);
  useEffect(() => {
    let last = 0;
    let queued = false;
    let timer: ReturnType<typeof setTimeout> | null = null;
    let alive = true;
    const draw = () => {
      queued = false;
      if (!alive) return;
      last = performance.now();
      flushSync(() => setVersion(store.version));
    };
    const request = () => {
      if (queued || timer) return;
      const wait = store.settled ? 0 : MIN_INTERVAL_MS - (performance.now() - last);
      const go = () => {
        timer = null;
        queued = true;
        enqueueDraw(draw);
      };
      if (wait <= 0) go();
      else timer = setTimeout(go, wait);
    };
    const unsubscribe = store.subscribe(() => {
      // The final rows must not wait behind the throttle.
      if (store.settled && timer) {
        clearTimeout(timer);
        timer = null;
      }
      request();
    });
    return () => {
      alive = false;
      if (timer) clearTimeout(timer);
      unsubscribe();
    };
  }, [store]);
  return version;
}
