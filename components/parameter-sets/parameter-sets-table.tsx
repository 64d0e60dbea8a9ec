"use client";

import { useState } from "react";

import { messageOf } from "@/lib/client/data/api-fetch";
import { formatWhen, personName } from "@/lib/client/data/format";
import { allValues, keyValues, provenanceText } from "@/lib/client/data/parameter-set-words";
import type { ParameterSetListResponse } from "@/lib/client/data/types";
import { useDeleteParameterSet, useParameterSets } from "@/lib/client/data/use-parameter-sets";

import { EditSetValues } from "./edit-set-values";
import { ParameterSetActions } from "./parameter-set-actions";
import { ParameterSetVersions } from "./parameter-set-versions";

export interface ParameterSetsTableProps {
  slug: string;
  canEdit: boolean;
  initial: ParameterSetListResponse;
}

/** The team's library of parameter sets: key values, where they come from, who made them. */
export function ParameterSetsTable({ slug, canEdit, initial }: ParameterSetsTableProps) {
  const list = useParameterSets(slug, initial);
  const remove = useDeleteParameterSet(slug);
  const [open, setOpen] = useState<string | null>(null);
  const items = list.data?.items ?? [];
  return (
    <div className="space-y-3">
      {list.isError ? <p className="text-sm text-kiln-dark">{messageOf(list.error)}</p> : null}
      {remove.isError ? <p className="text-sm text-kiln-dark">{messageOf(remove.error)}</p> : null}
      <div className="relative overflow-x-auto rounded-lg border border-glaze-line bg-white/70">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-glaze-line bg-glaze-deep/60 text-xs text-ink-soft">
            <tr>
              <th className="px-3 py-2 font-medium">Name</th>
              <th className="px-3 py-2 font-medium">Key values</th>
              <th className="px-3 py-2 font-medium">Provenance</th>
              <th className="px-3 py-2 font-medium">Author</th>
              <th className="px-3 py-2 font-medium">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {items.map((set) => (
              <ParameterSetRow
                key={set.id}
                slug={slug}
                set={set}
                canEdit={canEdit}
                open={open === set.id}
                onToggle={() => setOpen(open === set.id ? null : set.id)}
                onDelete={() => remove.mutate(set.id)}
              />
            ))}
            {list.data && items.length === 0 ? (
              <tr>
                <td colSpan={5} className="px-3 py-6 text-center text-ink-soft">
                  No parameter sets yet. Fits save theirs here.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}

interface ParameterSetRowProps {
  slug: string;
  set: ParameterSetListResponse["items"][number];
  canEdit: boolean;
  open: boolean;
  onToggle: () => void;
  onDelete: () => void;
}

function ParameterSetRow({ slug, set, canEdit, open, onToggle, onDelete }: ParameterSetRowProps) {
  return (
    <>
      <tr className="border-b border-glaze-line/70 align-top">
        <td className="px-3 py-2 font-medium">
          {set.name}
          <div className="text-xs font-normal text-ink-faint">Version {set.version}</div>
        </td>
        <td className="px-3 py-2 font-mono text-xs">
          {keyValues(set.values).map(([k, v]) => (
            <span key={k} className="mr-3 inline-block whitespace-nowrap">
              {k} {v}
            </span>
          ))}
        </td>
        <td className="px-3 py-2 text-ink-soft">{provenanceText(set.provenance)}</td>
        <td className="px-3 py-2 text-ink-soft">
          {personName(set.createdBy)}
          <div className="text-xs text-ink-faint">updated {formatWhen(set.updatedAt)}</div>
        </td>
        <td className="whitespace-nowrap px-3 py-2 text-right">
          <ParameterSetActions
            slug={slug}
            set={set}
            canEdit={canEdit}
            open={open}
            onToggle={onToggle}
            onDelete={onDelete}
          />
        </td>
      </tr>
      {open ? (
        <tr className="border-b border-glaze-line/70 bg-glaze-deep/30">
          <td colSpan={5} className="px-3 py-2">
            <dl className="grid grid-cols-2 gap-x-6 gap-y-1 font-mono text-xs sm:grid-cols-3 lg:grid-cols-4">
              {allValues(set.values).map((v) => (
                <div key={v.symbol} className="flex justify-between gap-2">
                  <dt className="text-ink-soft">{v.symbol}</dt>
                  <dd>{v.text}</dd>
                </div>
              ))}
            </dl>
            {set.provenance.note ? (
              <p className="mt-2 whitespace-pre-wrap text-sm text-ink-soft">
                {set.provenance.note}
              </p>
            ) : null}
            {canEdit ? <EditSetValues slug={slug} set={set} /> : null}
            <ParameterSetVersions slug={slug} setId={set.id} />
          </td>
        </tr>
      ) : null}
    </>
  );
}
