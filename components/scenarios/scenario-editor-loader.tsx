"use client";

import dynamic from "next/dynamic";

/** Client only: the loading desk starts its solver worker on mount. */
export const ScenarioEditorLoader = dynamic(
  () => import("./scenario-editor").then((m) => m.ScenarioEditor),
  {
    ssr: false,
    loading: () => <p className="px-4 py-8 text-ink-faint">Loading the loading desk…</p>,
  },
);
