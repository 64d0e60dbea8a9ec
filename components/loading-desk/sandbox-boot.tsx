"use client";

import { useState } from "react";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import type { OpenedScenario } from "@/lib/client/loading-desk/scenario-state";
import { decodeState, readHash } from "@/lib/client/loading-desk/url-state";
import { LoadingDesk } from "./loading-desk";

function boot(): { scenario: OpenedScenario; error: string[] | null } {
  const encoded = readHash(window.location.hash);
  if (!encoded) return { scenario: defaultScenario(), error: null };
  const decoded = decodeState(encoded);
  if (decoded.ok) return { scenario: decoded.scenario, error: null };
  return { scenario: defaultScenario(), error: decoded.errors };
}

/** Opens the scenario of the link if there is one, else the default; says why a link failed. */
export function SandboxBoot() {
  const [{ scenario, error }] = useState(boot);
  return (
    <>
      {error && (
        <div
          role="alert"
          className="mx-auto mt-4 max-w-[1600px] rounded-md border border-kiln/40 bg-kiln-light px-4 py-2 text-sm text-kiln-dark"
        >
          The scenario in this link could not be opened, so the sandbox shows its default instead:
          <ul className="list-disc pl-5 font-mono text-xs">
            {error.slice(0, 8).map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        </div>
      )}
      <LoadingDesk initialScenario={scenario} syncUrl />
    </>
  );
}
