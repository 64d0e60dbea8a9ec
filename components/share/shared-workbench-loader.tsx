"use client";

import dynamic from "next/dynamic";

/** Client only: the shared revision is computed by the viewer's own browser. */
export const SharedWorkbenchLoader = dynamic(
  () => import("./shared-workbench").then((m) => m.SharedWorkbench),
  {
    ssr: false,
    loading: () => (
      <p className="mx-auto max-w-[1600px] px-4 py-8 text-ink-faint">Loading the workbench…</p>
    ),
  },
);
