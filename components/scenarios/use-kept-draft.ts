"use client";

import { useCallback, useMemo, useRef, useState } from "react";
import {
  deskFileOf,
  differsFromSaved,
  draftKey,
  type DraftPlace,
  type KeptDraft,
  readDraft,
  serializeDraft,
} from "@/lib/client/loading-desk/kept-draft";
import type { OpenedScenario, ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";

// Storage can be off or full (private windows, quotas): a draft is a convenience, never a failure.
function storageGet(key: string): string | null {
  try {
    return window.localStorage.getItem(key);
  } catch {
    return null;
  }
}
function storageSet(key: string, value: string): void {
  try {
    window.localStorage.setItem(key, value);
  } catch {
    /* not kept: the desk still works */
  }
}
function storageRemove(key: string): void {
  try {
    window.localStorage.removeItem(key);
  } catch {
    /* nothing to remove */
  }
}

export interface KeptDraftControls {
  /** True when the desk's scenario differs from the saved revision. */
  unsaved: boolean;
  /** A draft found on opening, waiting for Restore or Discard. */
  offer: KeptDraft | null;
  /** Every file the desk writes; keeps or drops the draft. */
  report: (file: ScenarioFileJson) => void;
  restore: () => OpenedScenario | null;
  discard: () => void;
  /** After a successful save: the draft is done with. */
  clear: () => void;
}

/**
 * The unsaved mark's state and the browser-kept draft of one scenario revision. While a found
 * draft waits for an answer it is not overwritten, so opening the page cannot destroy it.
 */
export function useKeptDraft(
  place: DraftPlace,
  saved: OpenedScenario,
  enabled: boolean,
): KeptDraftControls {
  const key = draftKey(place);
  const savedFile = useMemo(() => deskFileOf(saved), [saved]);
  const [offer, setOffer] = useState<KeptDraft | null>(() =>
    enabled ? readDraft(storageGet(key)) : null,
  );
  const [unsaved, setUnsaved] = useState(false);
  const waiting = useRef(offer !== null);
  const done = useRef(false);

  const report = useCallback(
    (file: ScenarioFileJson) => {
      const changed = differsFromSaved(file, savedFile);
      setUnsaved(changed);
      if (!enabled || waiting.current || done.current) return;
      if (changed) storageSet(key, serializeDraft(file, new Date()));
      else storageRemove(key);
    },
    [enabled, key, savedFile],
  );

  const restore = useCallback(() => {
    waiting.current = false;
    const found = offer;
    setOffer(null);
    return found?.scenario ?? null;
  }, [offer]);

  const discard = useCallback(() => {
    waiting.current = false;
    setOffer(null);
    storageRemove(key);
  }, [key]);

  const clear = useCallback(() => {
    done.current = true;
    setUnsaved(false);
    storageRemove(key);
  }, [key]);

  return { unsaved, offer, report, restore, discard, clear };
}
