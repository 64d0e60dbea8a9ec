"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { MAX_FILE_BYTES } from "@/lib/csv/limits";

import { UploadCard } from "./upload-card";

interface Picked {
  key: number;
  name: string;
  text: string;
}

/** Drop or pick several CSV files; each gets its own mapping and metadata card. */
export function UploadPanel({ teamSlug }: { teamSlug: string }) {
  const router = useRouter();
  const [files, setFiles] = useState<Picked[]>([]);
  const [notes, setNotes] = useState<string[]>([]);
  const [dragging, setDragging] = useState(false);

  async function add(list: FileList | null) {
    if (!list) return;
    const next: Picked[] = [];
    const skipped: string[] = [];
    for (const f of Array.from(list)) {
      if (f.size > MAX_FILE_BYTES) skipped.push(`${f.name}: larger than 10 MB, not read.`);
      else next.push({ key: Date.now() + Math.random(), name: f.name, text: await f.text() });
    }
    setNotes(skipped);
    setFiles((prev) => [...prev, ...next]);
  }

  const remove = (key: number) => setFiles((prev) => prev.filter((f) => f.key !== key));

  return (
    <section aria-labelledby="upload-title" className="space-y-4">
      <h2 id="upload-title" className="font-display text-lg font-semibold">
        Upload test curves
      </h2>
      <label
        htmlFor="test-files"
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={(e) => {
          e.preventDefault();
          setDragging(false);
          void add(e.dataTransfer.files);
        }}
        className={`block cursor-pointer rounded-lg border-2 border-dashed p-6 text-center text-sm ${dragging ? "border-verdigris bg-verdigris-light" : "border-glaze-line"}`}
      >
        Drop CSV files here, or click to choose (comma, semicolon or tab; up to 10 MB and 200,000
        rows each).
        <input
          id="test-files"
          type="file"
          accept=".csv,.txt,.tsv,text/csv,text/plain"
          multiple
          className="sr-only"
          onChange={(e) => {
            void add(e.target.files);
            e.target.value = "";
          }}
        />
      </label>
      {notes.map((n) => (
        <p key={n} role="alert" className="text-sm text-kiln-dark">
          {n}
        </p>
      ))}
      <ul className="space-y-4">
        {files.map((f, i) => (
          <UploadCard
            key={f.key}
            index={i}
            teamSlug={teamSlug}
            file={f}
            onRemove={() => remove(f.key)}
            onSaved={() => {
              remove(f.key);
              router.refresh();
            }}
          />
        ))}
      </ul>
    </section>
  );
}
