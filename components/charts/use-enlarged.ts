"use client";

import { type KeyboardEvent, type RefObject, useCallback, useEffect, useState } from "react";

const FOCUSABLE = "button, select, input, a[href], [tabindex]:not([tabindex='-1'])";

/**
 * A chart shown over the page as a dialog: Escape or the backdrop closes it, Tab stays inside,
 * the page behind does not scroll, and focus goes back to the button that opened it. The chart
 * stays the same element (no second Plotly instance), so zoom, cursor and image saving carry on.
 */
export function useEnlarged(
  box: RefObject<HTMLElement | null>,
  opener: RefObject<HTMLButtonElement | null>,
) {
  const [enlarged, setEnlarged] = useState(false);
  const close = useCallback(() => {
    setEnlarged(false);
    opener.current?.focus();
  }, [opener]);

  useEffect(() => {
    if (!enlarged) return;
    const onKey = (e: globalThis.KeyboardEvent) => {
      if (e.key !== "Escape") return;
      e.preventDefault();
      close();
    };
    document.addEventListener("keydown", onKey);
    const overflow = document.body.style.overflow;
    document.body.style.overflow = "hidden";
    return () => {
      document.removeEventListener("keydown", onKey);
      document.body.style.overflow = overflow;
    };
  }, [enlarged, close]);

  // Keeps Tab and Shift+Tab among the dialog's own controls.
  const onKeyDown = (e: KeyboardEvent<HTMLElement>) => {
    if (!enlarged || e.key !== "Tab" || !box.current) return;
    const items = Array.from(box.current.querySelectorAll<HTMLElement>(FOCUSABLE));
    if (items.length === 0) return;
    const first = items[0];
    const last = items[items.length - 1];
    if (e.shiftKey && document.activeElement === first) {
      e.preventDefault();
      last.focus();
    } else if (!e.shiftKey && document.activeElement === last) {
      e.preventDefault();
      first.focus();
    }
  };

  const toggle = () => (enlarged ? close() : setEnlarged(true));
  return { enlarged, toggle, close, onKeyDown };
}
