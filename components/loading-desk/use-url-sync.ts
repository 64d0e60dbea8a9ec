"use client";

import { useEffect } from "react";
import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { encodeState, URL_STATE_KEY } from "@/lib/client/loading-desk/url-state";

/** Writes the scenario into the address (#s=…) a moment after the last change. */
export function useUrlSync(file: ScenarioFileJson, enabled: boolean) {
  useEffect(() => {
    if (!enabled) return;
    const t = setTimeout(() => {
      const url = `${location.pathname}${location.search}#${URL_STATE_KEY}=${encodeState(file)}`;
      history.replaceState(history.state, "", url);
    }, 400);
    return () => clearTimeout(t);
  }, [file, enabled]);
}
