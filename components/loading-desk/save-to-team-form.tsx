"use client";

import Link from "next/link";
import { useState } from "react";

import { Field, FieldError } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { ApiError, messageOf } from "@/lib/client/data/api-fetch";
import type { CreateScenarioResponse } from "@/lib/client/data/types";
import type { CreateScenarioVars } from "@/lib/client/data/use-save-revision";
import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";

/** A team the signed-in engineer may create scenarios in (editor or owner). */
export interface SaveTeamChoice {
  slug: string;
  name: string;
}

export interface SaveToTeamFormProps {
  teams: readonly SaveTeamChoice[];
  /** The desk's scenario as it is now; its name fills the name field. */
  file: ScenarioFileJson;
  /** Creates the scenario with revision 1 in the chosen team (createScenarioIn). */
  create: (slug: string, vars: CreateScenarioVars) => Promise<CreateScenarioResponse>;
  onCreated: (slug: string, created: CreateScenarioResponse) => void;
  onCancel: () => void;
}

type FieldName = "team" | "name" | "message";
type Errors = Partial<Record<FieldName | "form", string>>;

const NAME_MAX = 200;
const SELECT =
  "mt-1 block w-full rounded-md border border-glaze-line bg-white px-3 py-2 text-ink shadow-sm aria-[invalid]:border-kiln";

function checkInput(team: string, name: string): Errors {
  const errors: Errors = {};
  if (!team) errors.team = "Choose the team that keeps the scenario.";
  if (!name) errors.name = "Give the scenario a name.";
  else if (name.length > NAME_MAX) errors.name = `Keep the name under ${NAME_MAX} characters.`;
  return errors;
}

/** The server's refusal placed beside the field it is about (invalid:name → the name field). */
function placeServerError(error: unknown): Errors {
  const message = messageOf(error);
  if (!(error instanceof ApiError)) return { form: message };
  if (error.code === "invalid:name") return { name: message };
  if (error.code === "invalid:message") return { message };
  if (error.code.startsWith("forbidden") || error.code.startsWith("not-found"))
    return { team: message };
  return { form: message };
}

/** Saves the sandbox's scenario into a team as a new scenario with its revision 1. */
export function SaveToTeamForm({ teams, file, create, onCreated, onCancel }: SaveToTeamFormProps) {
  const [team, setTeam] = useState(teams.length === 1 ? teams[0].slug : "");
  const [name, setName] = useState(file.name);
  const [message, setMessage] = useState("First revision, from the sandbox");
  const [errors, setErrors] = useState<Errors>({});
  const [pending, setPending] = useState(false);

  if (teams.length === 0) return <NoTeamToSaveIn onCancel={onCancel} />;

  const submit = async () => {
    const trimmed = name.trim();
    const found = checkInput(team, trimmed);
    setErrors(found);
    if (Object.keys(found).length) return;
    setPending(true);
    try {
      const created = await create(team, {
        name: trimmed,
        materialLabel: "",
        tags: [],
        message: message.trim(),
        file: { ...file, name: trimmed },
      });
      onCreated(team, created);
    } catch (e) {
      setErrors(placeServerError(e));
      setPending(false);
    }
  };

  return (
    <form
      aria-label="Save to team"
      noValidate
      className="space-y-3 rounded-lg border border-verdigris/40 bg-verdigris-light/40 p-3"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      <p className="text-sm text-ink-soft">
        Creates a scenario in the team&apos;s store with this path and these sets as revision 1.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label htmlFor="save-team" className="block text-sm font-medium text-ink">
            Team
          </label>
          <select
            id="save-team"
            value={team}
            onChange={(e) => setTeam(e.target.value)}
            aria-invalid={errors.team ? true : undefined}
            aria-describedby={errors.team ? "save-team-error" : undefined}
            className={SELECT}
          >
            {teams.length > 1 ? <option value="">Choose a team</option> : null}
            {teams.map((t) => (
              <option key={t.slug} value={t.slug}>
                {t.name}
              </option>
            ))}
          </select>
          <FieldError id="save-team-error" message={errors.team} />
        </div>
        <Field
          id="save-name"
          label="Scenario name"
          value={name}
          maxLength={NAME_MAX}
          onChange={(e) => setName(e.target.value)}
          error={errors.name}
        />
      </div>
      <div>
        <label htmlFor="save-message" className="block text-sm font-medium text-ink">
          What this revision holds (revision message)
        </label>
        <textarea
          id="save-message"
          value={message}
          maxLength={2000}
          rows={2}
          onChange={(e) => setMessage(e.target.value)}
          aria-invalid={errors.message ? true : undefined}
          aria-describedby={errors.message ? "save-message-error" : undefined}
          className="mt-1 block w-full rounded-md border border-glaze-line bg-white px-3 py-2 text-sm"
        />
        <FieldError id="save-message-error" message={errors.message} />
      </div>
      {errors.form ? <FormMessage tone="error">{errors.form}</FormMessage> : null}
      <div className="flex gap-2">
        <button
          type="submit"
          disabled={pending}
          className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark disabled:opacity-60"
        >
          {pending ? "Saving…" : "Save as revision 1"}
        </button>
        <button
          type="button"
          onClick={onCancel}
          className="rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm"
        >
          Keep editing
        </button>
      </div>
    </form>
  );
}

function NoTeamToSaveIn({ onCancel }: { onCancel: () => void }) {
  return (
    <div
      role="status"
      className="space-y-2 rounded-lg border border-glaze-line bg-glaze-deep p-3 text-sm text-ink-soft"
    >
      <p>
        No team lets you create scenarios: saving needs the editor or owner role in a team. Create a
        team of your own, or ask a team&apos;s owner to make you an editor. The sandbox keeps
        working meanwhile; &ldquo;Copy link&rdquo; keeps this scenario.
      </p>
      <div className="flex gap-2">
        <Link
          href="/teams#create-team"
          className="rounded-md bg-kiln px-3 py-1.5 text-white hover:bg-kiln-dark"
        >
          Create a team
        </Link>
        <button
          type="button"
          onClick={onCancel}
          className="rounded-md border border-glaze-line bg-white px-3 py-1.5"
        >
          Keep editing
        </button>
      </div>
    </div>
  );
}
