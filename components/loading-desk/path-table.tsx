"use client";

import type { ControlKind, Leg } from "@/lib/mechanics/types";
import type { PathDoc } from "@/lib/scenario/path-text/path-doc";
import {
  appendLeg,
  appendRepeat,
  type LegAt,
  moveItem,
  removeLeg,
  setComponent,
  updateItem,
  updateLeg,
} from "@/lib/client/loading-desk/path-doc-edit";
import { NumberCell } from "./number-cell";

export interface PathTableProps {
  doc: PathDoc;
  readOnly?: boolean;
  onChange: (doc: PathDoc) => void;
}

const DIRS = ["11", "22", "12"] as const;
const btn =
  "rounded border border-glaze-line px-1.5 text-xs text-ink-soft hover:bg-glaze-deep disabled:opacity-40";

/** The same path object as the text, one row per leg; repeat blocks shown with their legs. */
export function PathTable({ doc, readOnly, onChange }: PathTableProps) {
  const legRow = (leg: Leg, at: LegAt, label: string, indent: boolean) => (
    <tr key={`${at.item}-${at.leg}`} className="border-t border-glaze-line/60">
      <th
        scope="row"
        className={`py-1 text-left text-xs font-normal text-ink-faint ${indent ? "pl-4" : ""}`}
      >
        {label}
      </th>
      {DIRS.map((d, c) => (
        <td key={d} className="px-1">
          <div className="flex gap-1">
            {readOnly ? (
              <span className="text-xs text-ink-soft">{leg.control[c]}</span>
            ) : (
              <select
                aria-label={`${label}: control of ${d}`}
                value={leg.control[c]}
                onChange={(e) =>
                  onChange(
                    updateLeg(doc, at, (l) =>
                      setComponent(l, c as 0 | 1 | 2, e.target.value as ControlKind, l.target[c]),
                    ),
                  )
                }
                className="rounded border border-glaze-line bg-white text-xs"
              >
                <option value="strain">strain</option>
                <option value="stress">stress</option>
              </select>
            )}
            <NumberCell
              value={leg.target[c]}
              label={`${label}: target of ${d} (${leg.control[c] === "strain" ? "mm/mm" : "MPa"})`}
              disabled={readOnly}
              onCommit={(v) =>
                onChange(
                  updateLeg(doc, at, (l) => setComponent(l, c as 0 | 1 | 2, l.control[c], v)),
                )
              }
            />
          </div>
        </td>
      ))}
      <td className="px-1">
        <NumberCell
          value={leg.increments}
          integer
          min={1}
          label={`${label}: increments`}
          disabled={readOnly}
          onCommit={(v) => onChange(updateLeg(doc, at, (l) => ({ ...l, increments: v })))}
        />
      </td>
      <td className="whitespace-nowrap px-1">
        {!readOnly && (
          <button
            type="button"
            className={btn}
            onClick={() => onChange(removeLeg(doc, at))}
            aria-label={`Remove ${label}`}
          >
            ✕
          </button>
        )}
      </td>
    </tr>
  );

  let n = 0;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Path legs">
        <thead>
          <tr className="text-left text-xs text-ink-faint">
            <th scope="col" className="font-normal">
              leg
            </th>
            {DIRS.map((d) => (
              <th key={d} scope="col" className="px-1 font-normal">
                {d}: control, target
              </th>
            ))}
            <th scope="col" className="px-1 font-normal">
              increments
            </th>
            <th />
          </tr>
        </thead>
        {doc.items.map((item, i) => (
          <tbody key={i}>
            {item.kind === "leg" ? (
              legRow(item.leg, { item: i, leg: null }, `leg ${++n}`, false)
            ) : (
              <>
                <tr className="border-t border-glaze-line bg-glaze-deep/50">
                  <th scope="row" colSpan={6} className="py-1 text-left text-xs font-normal">
                    <span className="flex flex-wrap items-center gap-2">
                      <span className="font-semibold">repeat</span>
                      <span className="w-16">
                        <NumberCell
                          value={item.block.count}
                          integer
                          min={1}
                          label={`repeat block ${i + 1}: count`}
                          disabled={readOnly}
                          onCommit={(v) =>
                            onChange(
                              updateItem(doc, i, {
                                kind: "repeat",
                                block: { ...item.block, count: v },
                              }),
                            )
                          }
                        />
                      </span>
                      <span>times, targets grow by</span>
                      <span className="w-16">
                        <NumberCell
                          value={item.block.grow}
                          label={`repeat block ${i + 1}: growth per cycle`}
                          disabled={readOnly}
                          onCommit={(v) =>
                            onChange(
                              updateItem(doc, i, {
                                kind: "repeat",
                                block: { ...item.block, grow: v },
                              }),
                            )
                          }
                        />
                      </span>
                      <span>× the first cycle per cycle</span>
                      {!readOnly && (
                        <button
                          type="button"
                          className={btn}
                          onClick={() => onChange(appendLeg(doc, i))}
                        >
                          + leg in block
                        </button>
                      )}
                    </span>
                  </th>
                  <td />
                </tr>
                {item.block.legs.map((leg, k) =>
                  legRow(leg, { item: i, leg: k }, `block ${i + 1}, leg ${k + 1}`, true),
                )}
              </>
            )}
            {!readOnly && doc.items.length > 1 && (
              <tr>
                <td colSpan={6} className="pb-1 text-right">
                  <button
                    type="button"
                    className={btn}
                    disabled={i === 0}
                    onClick={() => onChange(moveItem(doc, i, -1))}
                    aria-label={`Move item ${i + 1} up`}
                  >
                    ↑
                  </button>{" "}
                  <button
                    type="button"
                    className={btn}
                    disabled={i === doc.items.length - 1}
                    onClick={() => onChange(moveItem(doc, i, 1))}
                    aria-label={`Move item ${i + 1} down`}
                  >
                    ↓
                  </button>
                </td>
              </tr>
            )}
          </tbody>
        ))}
      </table>
      {!readOnly && (
        <div className="mt-2 flex gap-2">
          <button type="button" className={btn} onClick={() => onChange(appendLeg(doc, null))}>
            + leg
          </button>
          <button type="button" className={btn} onClick={() => onChange(appendRepeat(doc))}>
            + repeat block
          </button>
        </div>
      )}
    </div>
  );
}
