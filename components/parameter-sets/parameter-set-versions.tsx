"use client";

import { messageOf } from "@/lib/client/data/api-fetch";
import { useParameterSet } from "@/lib/client/data/use-parameter-sets";

import { ParameterSetHistory } from "./parameter-set-history";

/** Loads an opened set's versions and shows its history. */
export function ParameterSetVersions({ slug, setId }: { slug: string; setId: string }) {
  const set = useParameterSet(slug, setId);
  if (set.isError) return <p className="mt-2 text-sm text-kiln-dark">{messageOf(set.error)}</p>;
  if (!set.data) return <p className="mt-2 text-xs text-ink-faint">Loading the history…</p>;
  return <ParameterSetHistory versions={set.data.versions} />;
}
