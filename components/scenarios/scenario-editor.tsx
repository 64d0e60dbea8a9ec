"use client";

import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";

import { LoadingDesk } from "@/components/loading-desk/loading-desk";
import type { OpenedScenario, ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { messageOf } from "@/lib/client/data/api-fetch";
import { useLibraryChoices } from "@/lib/client/data/use-library-choices";
import { teamPages } from "@/lib/client/data/api-urls";
import { type SaveConflict, saveConflictOf } from "@/lib/client/data/conflict";
import { useSaveRevision } from "@/lib/client/data/use-save-revision";
import { useRecordOverlays } from "@/lib/client/data/use-test-records";
import { type DeskOverlay, readDeskOverlays } from "@/lib/scenario/desk-extras";

import { ConflictPanel } from "./conflict-panel";
import { DraftOffer } from "./draft-offer";
import { MissingRecordsNotice } from "./missing-records-notice";
import { RecordOverlayPicker } from "./record-overlay-picker";
import { SaveRevisionForm } from "./save-revision-form";
import { useKeptDraft } from "./use-kept-draft";
import { useLeaveGuard } from "./use-leave-guard";

export interface ScenarioEditorProps {
  slug: string;
  scenarioId: string;
  /** The revision on screen; saves name it as their base. */
  number: number;
  file: OpenedScenario;
  editable: boolean;
  /** The team named in the read-only banner. */
  teamName?: string;
}

/** The loading desk on a saved revision, with save-as-new-revision and the 409 path. */
export function ScenarioEditor({
  slug,
  scenarioId,
  number,
  file,
  editable,
  teamName,
}: ScenarioEditorProps) {
  const router = useRouter();
  const save = useSaveRevision(slug, scenarioId);
  const [pending, setPending] = useState<ScenarioFileJson | null>(null);
  const [conflict, setConflict] = useState<SaveConflict | null>(null);
  const [message, setMessage] = useState("");
  const [error, setError] = useState<string | null>(null);
  const library = useLibraryChoices(slug);
  // A restored draft reopens the desk on the kept file; the saved revision stays the baseline.
  const [opened, setOpened] = useState<{ scenario: OpenedScenario; key: number }>({
    scenario: file,
    key: 0,
  });
  // Which test records are drawn over the charts: part of the revision (its desk field).
  const [chosen, setChosen] = useState<DeskOverlay[]>(() => readDeskOverlays(file.desk));
  const recordIds = useMemo(() => chosen.map((c) => c.recordId), [chosen]);
  const records = useRecordOverlays(slug, recordIds);
  const missing = records.missing.flatMap((k) => (chosen[k] ? [chosen[k]] : []));
  const draft = useKeptDraft({ team: slug, scenarioId, baseRevision: number }, file, editable);
  useLeaveGuard(editable && draft.unsaved);

  const restoreDraft = () => {
    const scenario = draft.restore();
    if (!scenario) return;
    setOpened((o) => ({ scenario, key: o.key + 1 }));
    setChosen(readDeskOverlays(scenario.desk));
  };

  const submit = (base: number, text: string) => {
    if (!pending) return;
    setMessage(text);
    setError(null);
    save.mutate(
      { baseRevision: base, message: text, file: pending },
      {
        onSuccess: () => {
          draft.clear();
          setPending(null);
          setConflict(null);
          router.push(teamPages(slug).scenario(scenarioId));
          router.refresh();
        },
        onError: (e) => {
          const clash = saveConflictOf(e, base);
          if (clash) setConflict(clash);
          else setError(messageOf(e));
        },
      },
    );
  };

  const dismiss = () => {
    setPending(null);
    setConflict(null);
    setError(null);
  };

  return (
    <div className="space-y-3">
      {draft.offer ? (
        <div className="mx-auto max-w-[1600px] px-4">
          <DraftOffer
            savedAt={draft.offer.savedAt}
            onRestore={restoreDraft}
            onDiscard={draft.discard}
          />
        </div>
      ) : null}
      {pending && conflict ? (
        <div className="mx-auto max-w-[1600px] px-4">
          <ConflictPanel
            slug={slug}
            scenarioId={scenarioId}
            conflict={conflict}
            mine={pending}
            message={message}
            pending={save.isPending}
            error={error}
            onSaveOnTop={submit}
            onDismiss={dismiss}
          />
        </div>
      ) : null}
      {pending && !conflict ? (
        <div className="mx-auto max-w-[1600px] px-4">
          <SaveRevisionForm
            summary={`Saves a new revision on top of revision ${number}; revision ${number} stays as it is.`}
            submitLabel="Save new revision"
            pending={save.isPending}
            error={error}
            initialMessage={message}
            onSubmit={(text) => submit(number, text)}
            onCancel={dismiss}
          />
        </div>
      ) : null}
      <div className="mx-auto max-w-[1600px] px-4">
        <RecordOverlayPicker
          slug={slug}
          selected={chosen}
          onChange={setChosen}
          loading={records.loading}
          errors={records.errors}
        />
      </div>
      {missing.length ? (
        <div className="mx-auto max-w-[1600px] px-4">
          <MissingRecordsNotice
            records={missing}
            onForget={
              editable
                ? (id) => setChosen((list) => list.filter((c) => c.recordId !== id))
                : undefined
            }
          />
        </div>
      ) : null}
      <LoadingDesk
        key={opened.key}
        library={library}
        initialScenario={opened.scenario}
        readOnly={!editable}
        teamName={teamName}
        unsaved={draft.unsaved}
        onFileChange={draft.report}
        onSave={editable ? (f) => setPending(f) : undefined}
        overlays={records.overlays}
        overlayChoice={chosen}
        revision={`revision ${number}`}
      />
    </div>
  );
}
