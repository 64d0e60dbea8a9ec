"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { createScenarioIn } from "@/lib/client/data/use-save-revision";
import { teamPages } from "@/lib/client/data/api-urls";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import {
  forgetKeptSandboxScenario,
  keepSandboxScenario,
  readKeptSandboxScenario,
} from "@/lib/client/loading-desk/kept-sandbox";
import type { OpenedScenario, ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { decodeState, readHash } from "@/lib/client/loading-desk/url-state";
import { LoadingDesk } from "./loading-desk";
import { SaveToTeamForm, type SaveTeamChoice } from "./save-to-team-form";

export interface SandboxBootProps {
  /** Null when signed out; else the teams where the engineer may create scenarios (may be none). */
  account: { teams: SaveTeamChoice[] } | null;
}

function boot(): { scenario: OpenedScenario; error: string[] | null } {
  // A link's scenario wins over work kept across sign-in: it is what the engineer just opened.
  const encoded = readHash(window.location.hash);
  if (!encoded) {
    return { scenario: readKeptSandboxScenario(localStorage) ?? defaultScenario(), error: null };
  }
  const decoded = decodeState(encoded);
  if (decoded.ok) return { scenario: decoded.scenario, error: null };
  return { scenario: defaultScenario(), error: decoded.errors };
}

/**
 * Opens the scenario of the link, or the work kept while signing in, else the default; says why a
 * link failed. Signed in, the save button saves into one of the engineer's teams.
 */
export function SandboxBoot({ account }: SandboxBootProps) {
  const router = useRouter();
  const [{ scenario, error }] = useState(boot);
  const [saving, setSaving] = useState<ScenarioFileJson | null>(null);
  // The desk holds the kept work now, and the address carries it from here on.
  useEffect(() => forgetKeptSandboxScenario(localStorage), []);
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
      {account && saving ? (
        <div className="mx-auto mt-4 max-w-[1600px] px-4">
          <SaveToTeamForm
            teams={account.teams}
            file={saving}
            create={createScenarioIn}
            onCreated={(slug, created) => {
              forgetKeptSandboxScenario(localStorage);
              router.push(teamPages(slug).scenario(created.scenario.id));
            }}
            onCancel={() => setSaving(null)}
          />
        </div>
      ) : null}
      <LoadingDesk
        initialScenario={scenario}
        syncUrl
        onSave={account ? (file) => setSaving(file) : undefined}
        saveLabel="Save to team…"
        onSignIn={(file) => keepSandboxScenario(localStorage, file)}
      />
    </>
  );
}
