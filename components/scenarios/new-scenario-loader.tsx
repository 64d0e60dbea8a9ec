"use client";

import dynamic from "next/dynamic";

/** Client only: the loading desk starts its solver worker on mount. */
export const NewScenarioLoader = dynamic(
  () => import("./new-scenario").then((m) => m.NewScenario),
  {
    ssr: false,
    loading: () => <p className="px-4 py-8 text-ink-faint">Loading the loading desk…</p>,
  },
);
