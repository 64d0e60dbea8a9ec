"use client";

import dynamic from "next/dynamic";

/** Client only: the workbench starts its solver worker on mount. */
export const NewScenarioLoader = dynamic(
  () => import("./new-scenario").then((m) => m.NewScenario),
  {
    ssr: false,
    loading: () => <p className="px-4 py-8 text-ink-faint">Loading the workbench…</p>,
  },
);
