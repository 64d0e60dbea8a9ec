"use client";

import { useEffect, useState } from "react";

interface Progress {
  name: string;
  total: number;
  done: number;
  failed: number;
  state: string;
  items: { position: number; setId: string; label: string; state: string; error: string | null }[];
}

/** Polls the study until every set has finished; then offers the results. */
export function StudyProgress({ team, studyId }: { team: string; studyId: string }) {
  const [progress, setProgress] = useState<Progress | null>(null);
  const [error, setError] = useState<string | null>(null);
  const url = `/api/v1/teams/${team}/studies/${studyId}`;
  useEffect(() => {
    let stopped = false;
    async function poll() {
      const res = await fetch(url).catch(() => null);
      const body = res ? await res.json().catch(() => null) : null;
      if (stopped) return;
      if (!res?.ok) return setError(body?.error?.message ?? "The study could not be read.");
      setProgress(body as Progress);
      if (body.done + body.failed < body.total) setTimeout(poll, 1000);
    }
    void poll();
    return () => {
      stopped = true;
    };
  }, [url]);
  if (error)
    return (
      <p role="alert" className="text-sm text-kiln-dark">
        {error}
      </p>
    );
  if (!progress) return <p className="text-sm text-ink-faint">Reading the study…</p>;
  const finished = progress.done + progress.failed;
  return (
    <div className="space-y-2" data-testid="study-progress">
      <p className="text-sm">
        {progress.name}: {finished} of {progress.total} sets finished ({progress.failed} failed) ·{" "}
        {progress.state}
      </p>
      <progress className="w-full" max={progress.total} value={finished} />
      {finished === progress.total ? (
        <a className="text-sm text-verdigris-dark hover:underline" href={`${url}/results`}>
          Download the results (zip)
        </a>
      ) : null}
      {progress.items
        .filter((i) => i.state === "failed")
        .map((i) => (
          <p key={i.position} className="text-xs text-kiln-dark">
            Set {i.setId} ({i.label}) failed: {i.error}
          </p>
        ))}
    </div>
  );
}
