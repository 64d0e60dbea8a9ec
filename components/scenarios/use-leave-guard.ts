"use client";

import { useEffect } from "react";
import { LEAVE_QUESTION, leavesThePage } from "@/lib/client/loading-desk/leave-guard";

/**
 * While `active`, asks before the page unloads and before an in-app link replaces it. The click
 * listener runs in the capture phase on the document, before Next's link handler, so a "Stay"
 * stops the client-side navigation too.
 */
export function useLeaveGuard(active: boolean): void {
  useEffect(() => {
    if (!active) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      // Older browsers show the question only when returnValue is set.
      e.returnValue = "";
    };
    const onClick = (e: MouseEvent) => {
      if (e.defaultPrevented) return;
      const anchor = e.target instanceof Element ? e.target.closest("a[href]") : null;
      if (!(anchor instanceof HTMLAnchorElement)) return;
      const click = {
        href: anchor.href,
        target: anchor.target,
        download: anchor.hasAttribute("download"),
        modified: e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey,
      };
      if (!leavesThePage(click, location.href)) return;
      if (window.confirm(LEAVE_QUESTION)) return;
      e.preventDefault();
      e.stopPropagation();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    document.addEventListener("click", onClick, true);
    return () => {
      window.removeEventListener("beforeunload", onBeforeUnload);
      document.removeEventListener("click", onClick, true);
    };
  }, [active]);
}
