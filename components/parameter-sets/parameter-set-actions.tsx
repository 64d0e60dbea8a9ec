"use client";

import { useState } from "react";

import { messageOf } from "@/lib/client/data/api-fetch";
import { sandboxLinkForSet } from "@/lib/client/data/sandbox-link";
import type { ParameterSetView } from "@/lib/client/data/types";
import { useRenameParameterSet } from "@/lib/client/data/use-parameter-sets";

export interface ParameterSetActionsProps {
  slug: string;
  set: ParameterSetView;
  canEdit: boolean;
  open: boolean;
  onToggle: () => void;
  onDelete: () => void;
}

const LINK = "text-verdigris-dark hover:underline";

/** Open for everyone; rename and delete (asked twice) for those who may edit. */
export function ParameterSetActions(props: ParameterSetActionsProps) {
  const { slug, set, canEdit } = props;
  const rename = useRenameParameterSet(slug);
  const [mode, setMode] = useState<"idle" | "rename" | "delete">("idle");
  const [name, setName] = useState(set.name);

  if (mode === "rename") {
    return (
      <form
        className="inline-flex flex-wrap items-center justify-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          rename.mutate({ id: set.id, name: name.trim() }, { onSuccess: () => setMode("idle") });
        }}
      >
        <label className="sr-only" htmlFor={`rename-${set.id}`}>
          New name of {set.name}
        </label>
        <input
          id={`rename-${set.id}`}
          value={name}
          maxLength={200}
          onChange={(e) => setName(e.target.value)}
          className="w-48 rounded-md border border-glaze-line bg-white px-2 py-1"
        />
        <button type="submit" disabled={rename.isPending || !name.trim()} className={LINK}>
          Save name
        </button>
        <button type="button" onClick={() => setMode("idle")} className="text-ink-soft">
          Cancel
        </button>
        {rename.isError ? (
          <span role="alert" className="block w-full text-kiln-dark">
            {messageOf(rename.error)}
          </span>
        ) : null}
      </form>
    );
  }
  if (mode === "delete") {
    return (
      <span className="inline-flex gap-2">
        <span className="text-kiln-dark">Delete “{set.name}”?</span>
        <button type="button" onClick={props.onDelete} className="text-kiln-dark underline">
          Delete
        </button>
        <button type="button" onClick={() => setMode("idle")} className="text-ink-soft">
          Keep
        </button>
      </span>
    );
  }
  return (
    <span className="inline-flex gap-3">
      <button type="button" onClick={props.onToggle} className={LINK} aria-expanded={props.open}>
        {props.open ? "Close" : "Open"}
      </button>
      <a
        href={sandboxLinkForSet(set.name, set.values)}
        className={LINK}
        title="Opens the set on the growing-cycles path in the sandbox; nothing is saved"
      >
        Try in the sandbox
      </a>
      {canEdit ? (
        <>
          <button type="button" onClick={() => setMode("rename")} className={LINK}>
            Rename
          </button>
          <button
            type="button"
            onClick={() => setMode("delete")}
            className="text-kiln-dark hover:underline"
          >
            Delete
          </button>
        </>
      ) : null}
    </span>
  );
}
