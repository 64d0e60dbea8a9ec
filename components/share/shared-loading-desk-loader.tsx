"use client";

import dynamic from "next/dynamic";

/** Client only: the shared revision is computed by the viewer's own browser. */
export const SharedLoadingDeskLoader = dynamic(
  () => import("./shared-loading-desk").then((m) => m.SharedLoadingDesk),
  {
    ssr: false,
    loading: () => (
      <p className="mx-auto max-w-[1600px] px-4 py-8 text-ink-faint">Loading the loading desk…</p>
    ),
  },
);
