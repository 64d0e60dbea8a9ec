"use client";

import { useState } from "react";

export interface NewLinkNoticeProps {
  url: string;
  onDone: () => void;
}

/** The new link, shown this once: only its hash is kept, so it cannot be shown again. */
export function NewLinkNotice({ url, onDone }: NewLinkNoticeProps) {
  const [note, setNote] = useState("");
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setNote("Copied.");
    } catch {
      setNote("The browser refused the clipboard; select the link and copy it.");
    }
  };
  return (
    <div
      className="space-y-2 rounded-md border border-verdigris/50 bg-verdigris-light/60 p-3"
      role="status"
    >
      <p className="font-medium">Copy this link now: it is shown only once.</p>
      <div className="flex flex-wrap items-center gap-2">
        <input
          readOnly
          value={url}
          aria-label="New share link"
          data-testid="new-share-link"
          onFocus={(e) => e.currentTarget.select()}
          className="min-w-0 flex-1 rounded-md border border-glaze-line bg-white px-2 py-1 font-mono text-xs"
        />
        <button
          type="button"
          onClick={copy}
          className="rounded-md border border-glaze-line bg-white px-3 py-1 hover:bg-glaze-deep"
        >
          Copy
        </button>
        <button type="button" onClick={onDone} className="text-ink-soft hover:underline">
          Done
        </button>
      </div>
      {note ? <p className="text-xs text-verdigris-dark">{note}</p> : null}
    </div>
  );
}
