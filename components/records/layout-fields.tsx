"use client";

import type { ReactNode } from "react";

import type { FileLayout, LayoutChoice } from "@/lib/csv/file-layout";

const DELIMITER_WORDS: Record<FileLayout["delimiter"], string> = {
  ",": "comma",
  ";": "semicolon",
  "\t": "tab",
};

export interface LayoutFieldsProps {
  idPrefix: string;
  detected: FileLayout;
  value: FileLayout;
  onChange: (next: LayoutChoice) => void;
}

const CONTROL = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";

/** One layout value: its label, its control, and what the detection found (outside the label). */
function LayoutField(props: { id: string; label: string; found: string; children: ReactNode }) {
  return (
    <div className="text-sm">
      <label htmlFor={props.id}>{props.label}</label>
      {props.children}
      <span id={`${props.id}-found`} className="block text-xs text-ink-faint">
        found: {props.found}
      </span>
    </div>
  );
}

/** Where the table starts and how its cells are written; every detected value can be changed. */
export function LayoutFields({ idPrefix, detected, value, onChange }: LayoutFieldsProps) {
  const set = (patch: LayoutChoice) => onChange({ ...value, ...patch });
  const id = (name: string) => `${idPrefix}-layout-${name}`;
  const described = (name: string) => ({ id: id(name), "aria-describedby": `${id(name)}-found` });
  const yesNo = (b: boolean) => (b ? "yes" : "no");
  return (
    <fieldset className="grid gap-3 sm:grid-cols-5">
      <legend className="mb-2 text-sm font-medium">Layout of the file</legend>
      <LayoutField id={id("skip")} label="Lines to skip" found={String(detected.skipLines)}>
        <input
          {...described("skip")}
          type="number"
          min={0}
          max={1000}
          className={CONTROL}
          value={value.skipLines}
          onChange={(e) => {
            const n = Number(e.target.value);
            if (Number.isInteger(n) && n >= 0 && n <= 1000) set({ skipLines: n });
          }}
        />
      </LayoutField>
      <LayoutField
        id={id("header")}
        label="Header row with column names"
        found={yesNo(detected.headerRow)}
      >
        <input
          {...described("header")}
          type="checkbox"
          className="mt-1 block"
          checked={value.headerRow}
          onChange={(e) =>
            set({ headerRow: e.target.checked, unitRow: e.target.checked && value.unitRow })
          }
        />
      </LayoutField>
      <LayoutField
        id={id("units")}
        label="Unit row under the header"
        found={yesNo(detected.unitRow)}
      >
        <input
          {...described("units")}
          type="checkbox"
          className="mt-1 block"
          checked={value.unitRow}
          disabled={!value.headerRow}
          onChange={(e) => set({ unitRow: e.target.checked })}
        />
      </LayoutField>
      <LayoutField
        id={id("delimiter")}
        label="Delimiter"
        found={DELIMITER_WORDS[detected.delimiter]}
      >
        <select
          {...described("delimiter")}
          className={CONTROL}
          value={value.delimiter}
          onChange={(e) => set({ delimiter: e.target.value as FileLayout["delimiter"] })}
        >
          {Object.entries(DELIMITER_WORDS).map(([d, words]) => (
            <option key={d} value={d}>
              {words}
            </option>
          ))}
        </select>
      </LayoutField>
      <LayoutField
        id={id("decimal")}
        label="Decimal mark"
        found={detected.decimalComma ? "comma" : "point"}
      >
        <select
          {...described("decimal")}
          className={CONTROL}
          value={value.decimalComma ? "comma" : "point"}
          onChange={(e) => set({ decimalComma: e.target.value === "comma" })}
        >
          <option value="point">point (1.5)</option>
          <option value="comma">comma (1,5)</option>
        </select>
      </LayoutField>
    </fieldset>
  );
}
