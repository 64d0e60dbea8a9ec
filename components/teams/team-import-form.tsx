"use client";

import Link from "next/link";
import { useId, useState } from "react";

import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { apiFetch, messageOf } from "@/lib/client/data/api-fetch";
import { teamApi, teamPages } from "@/lib/client/data/api-urls";
import {
  summarizeTeamExportText,
  type TeamImportSummary,
} from "@/lib/client/data/team-import-summary";
import type { TeamImportResponse } from "@/lib/server/workspace/import";

import { TeamImportSummaryView } from "./team-import-summary-view";

export interface TeamImportFormProps {
  teamSlug: string;
  /** What the team holds now: an import goes only into an empty team. */
  held: { scenarios: number; parameterSets: number; testRecords: number };
  /** The largest body the import route reads. */
  maxBytes: number;
}

type Outcome = { kind: "done"; created: TeamImportResponse } | { kind: "failed"; message: string };

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

function sizeWords(bytes: number): string {
  const mb = 1024 * 1024;
  return bytes >= mb ? `${Math.round(bytes / mb)} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

function createdWords(c: TeamImportResponse): string {
  return [
    plural(c.scenarios, "scenario"),
    plural(c.revisions, "revision"),
    plural(c.parameterSets, "parameter set"),
    plural(c.comments, "comment"),
    plural(c.testRecords, "test record"),
    plural(c.fits, "fit"),
  ].join(", ");
}

/** Choose a team export, see what it will create, then load it into this (empty) team. */
export function TeamImportForm({ teamSlug, held, maxBytes }: TeamImportFormProps) {
  const inputId = useId();
  const [summary, setSummary] = useState<TeamImportSummary | null>(null);
  const [pending, setPending] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const empty = held.scenarios === 0 && held.parameterSets === 0 && held.testRecords === 0;

  async function onFile(file: File | undefined) {
    setOutcome(null);
    if (!file) return setSummary(null);
    if (file.size > maxBytes) {
      const limit = `${sizeWords(maxBytes)}, the most an import takes`;
      return setSummary({ ok: false, problems: [`The file is larger than ${limit}.`] });
    }
    setSummary(summarizeTeamExportText(await file.text()));
  }

  async function onImport() {
    if (!summary?.ok) return;
    setPending(true);
    try {
      const created = await apiFetch<TeamImportResponse>(teamApi(teamSlug).importTeam(), {
        method: "POST",
        body: summary.doc,
      });
      setOutcome({ kind: "done", created });
    } catch (error) {
      setOutcome({ kind: "failed", message: messageOf(error) });
    } finally {
      setPending(false);
    }
  }

  const done = outcome?.kind === "done";
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-soft">
        Loads a file from &ldquo;Download the team export&rdquo; into this team: every scenario with
        its revisions, the parameter sets, comments and reviews, the test records with their
        original files, and the fits. Nothing is sent before you press Import, and an import writes
        all of the file or nothing.
      </p>
      {!empty && !done ? (
        <FormMessage tone="error">
          An import goes into an empty team, and this one holds {plural(held.scenarios, "scenario")}
          , {plural(held.parameterSets, "parameter set")} and{" "}
          {plural(held.testRecords, "test record")}. Create a new team on the{" "}
          <Link href="/teams" className="underline">
            teams page
          </Link>{" "}
          and import there.
        </FormMessage>
      ) : null}
      <div className="space-y-1">
        <label htmlFor={inputId} className="block text-sm font-medium">
          Team export file (.json)
        </label>
        <input
          id={inputId}
          type="file"
          accept=".json,application/json"
          disabled={pending || done}
          onChange={(e) => void onFile(e.target.files?.[0])}
          className="block text-sm"
        />
      </div>
      {summary && !summary.ok ? (
        <FormMessage tone="error">
          <p>This file cannot be imported:</p>
          <ul className="mt-1 list-disc pl-5" data-testid="import-problems">
            {summary.problems.map((p, i) => (
              <li key={i}>{p}</li>
            ))}
          </ul>
        </FormMessage>
      ) : null}
      {summary?.ok ? <TeamImportSummaryView summary={summary} /> : null}
      {summary?.ok ? (
        <p className="text-sm text-ink-soft">
          Comments and review history keep the names written in the file as text, marked as
          imported: they do not become accounts here, and an imported approval is shown as the
          file&rsquo;s, not as a sign-off given in this installation. Scenarios, revisions and
          parameter sets are credited to a member of this team with the same e-mail address, or to
          nobody.
        </p>
      ) : null}
      {outcome?.kind === "failed" ? (
        <FormMessage tone="error">{outcome.message}</FormMessage>
      ) : null}
      {done ? (
        <FormMessage tone="success">
          Imported {createdWords(outcome.created)}.{" "}
          <Link href={teamPages(teamSlug).scenarios} className="underline">
            Open the scenarios
          </Link>
        </FormMessage>
      ) : null}
      {summary?.ok && empty && !done ? (
        <Button type="button" pending={pending} onClick={() => void onImport()}>
          Import
        </Button>
      ) : null}
    </div>
  );
}
