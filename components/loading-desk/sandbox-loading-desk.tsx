"use client";

import dynamic from "next/dynamic";

/** The sandbox's loading desk, client only: it reads the scenario from the address on first render. */
export const SandboxLoadingDesk = dynamic(
  () => import("./sandbox-boot").then((m) => m.SandboxBoot),
  {
    ssr: false,
    loading: () => (
      <p className="mx-auto max-w-[1600px] px-4 py-8 text-ink-faint">Loading the loading desk…</p>
    ),
  },
);
