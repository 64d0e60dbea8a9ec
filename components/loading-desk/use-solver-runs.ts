"use client";

import { useEffect, useRef, useState } from "react";
import type { Leg } from "@/lib/mechanics/types";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { emitEvent } from "@/lib/client/loading-desk/instrumentation";
import { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import { SolverPool } from "@/workers/solver-client";

/**
 * Keeps every set's result in step with its parameters and the path: a change starts a new run
 * for the sets it touches and cancels their runs in flight.
 */
export function useSolverRuns(entries: SetEntry[], legs: Leg[] | null): ResultsStore {
  const [store] = useState(() => new ResultsStore());
  const pool = useRef<SolverPool | null>(null);
  const lastKey = useRef(new Map<string, string>());

  useEffect(() => {
    const p = new SolverPool();
    pool.current = p;
    const keys = lastKey.current;
    return () => {
      p.dispose();
      pool.current = null;
      keys.clear();
    };
  }, []);

  useEffect(() => {
    const p = pool.current;
    if (!p || !legs) return;
    const legsKey = JSON.stringify(legs);
    const changed = entries.filter(
      (e) => lastKey.current.get(e.set.id) !== JSON.stringify(e.set) + legsKey,
    );
    store.retain(entries.map((e) => e.set.id));
    for (const id of [...lastKey.current.keys()]) {
      if (!entries.some((e) => e.set.id === id)) {
        p.cancel(id);
        lastKey.current.delete(id);
      }
    }
    if (changed.length === 0) return;
    const gen = store.nextGeneration();
    emitEvent("edit", { gen, sets: changed.map((e) => e.set.id) });
    for (const e of changed) {
      const id = e.set.id;
      lastKey.current.set(id, JSON.stringify(e.set) + legsKey);
      store.begin(id, gen);
      emitEvent("run-start", { gen, set: id });
      p.run(id, toMaterialParams(e.set), legs, {
        onStart: (total) => store.start(id, total),
        onChunk: (chunk) => store.chunk(id, chunk),
        onDone: (status, scope) => {
          store.done(id, status);
          emitEvent("run-done", { gen, set: id, rows: store.get(id)?.buffer?.rows, scope });
        },
        onError: (message) => {
          // Forget the key so the same values may be tried again after a worker failure.
          lastKey.current.delete(id);
          store.fail(id, message);
          emitEvent("run-error", { gen, set: id, message });
        },
      });
    }
  }, [entries, legs, store]);

  return store;
}
