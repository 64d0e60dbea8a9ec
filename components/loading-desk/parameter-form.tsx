"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import {
  PARAMETER_FIELDS,
  type ParameterField,
  choiceText,
  labelOf,
} from "@/lib/scenario/parameter-fields";
import { rangeFor, unitFor } from "@/lib/client/loading-desk/field-text";
import { plausibilityWarnings } from "@/lib/scenario/plausibility";
import { shownNumber } from "@/lib/shared/shown-number";
import {
  type ParameterSet,
  type ParameterSetInput,
  parameterSetSchema,
} from "@/lib/scenario/parameter-set-schema";

export interface ParameterFormProps {
  set: ParameterSet;
  readOnly?: boolean;
  /** Called with every valid state of the form (invalid values stay in the form with a message). */
  onValid: (set: Omit<ParameterSet, "id">) => void;
}

const GROUPS: { title: string; symbols: string[] }[] = [
  { title: "Undamaged stiffness", symbols: ["E1", "E2", "nu12", "G12"] },
  { title: "Damage growth", symbols: ["Y0_1", "Y0_2", "a1", "a2", "b", "k6", "law"] },
  { title: "Permanent strain", symbols: ["alpha", "beta"] },
  {
    title: "Failure and damage frame",
    symbols: ["dcrit", "dmax", "onFailure", "Xc", "frame", "thetaD"],
  },
];

const FIELD = new Map(PARAMETER_FIELDS.map((f) => [f.symbol, f]));

/** Text to number: empty → undefined ("required"), junk → NaN ("must be a finite number"). */
function toNumber(f: ParameterField) {
  return (v: unknown) => {
    if (typeof v === "number") return v;
    const s = String(v ?? "").trim();
    if (s === "") return f.kind === "nullable-number" ? null : undefined;
    return Number(s);
  };
}

/** A value as the read-only desk shows it: a choice in words, a blank optional value as "off". */
function shownValue(f: ParameterField, value: unknown): string {
  if (value === null || value === undefined || value === "") return "off";
  if (f.kind === "choice") return choiceText(f, String(value));
  return typeof value === "number" ? shownNumber(value) : String(value);
}

/**
 * The input shows the stored value rounded (fitted values carry 16 digits) while the form keeps
 * the exact number: only the text in the box is rounded, once, when the box first appears; an
 * edit replaces the value with what was typed. React calls a ref again on every render, so the
 * boxes already rounded are remembered.
 */
function roundOnceShown(
  rounded: WeakSet<HTMLInputElement>,
  el: HTMLInputElement | null,
  value: unknown,
) {
  if (!el || rounded.has(el)) return;
  rounded.add(el);
  if (typeof value === "number") el.value = shownNumber(value);
}

/** A registered input's props whose ref also rounds the shown text. */
function withRoundedText<R extends { ref: (el: HTMLInputElement | null) => void }>(
  registered: R,
  afterRef: (el: HTMLInputElement | null) => void,
): R {
  return {
    ...registered,
    ref: (el: HTMLInputElement | null) => {
      registered.ref(el); // the form writes the exact value into the box here…
      afterRef(el); // …and the box then shows it rounded
    },
  };
}

export function ParameterForm({ set, readOnly, onValid }: ParameterFormProps) {
  const form = useForm<ParameterSetInput>({
    resolver: zodResolver(parameterSetSchema),
    mode: "onChange",
    defaultValues: set,
  });
  const { errors } = form.formState;
  const [rounded] = useState(() => new WeakSet<HTMLInputElement>());
  const law = String(useWatch({ control: form.control, name: "law" }) ?? "sqrtY");
  const values = useWatch({ control: form.control }) as Record<string, unknown>;
  const found = plausibilityWarnings(values);
  const warnings = new Map(found.map((w) => [w.field, w.message]));
  // A field can be both refused by the schema and implausible (E1 = -5): name it once.
  const invalid = [
    ...new Set([
      ...Object.keys(errors),
      ...found.filter((w) => w.severity === "implausible").map((w) => w.field),
    ]),
  ];

  useEffect(() => {
    return form.subscribe({
      formState: { values: true },
      callback: ({ values }) => {
        const parsed = parameterSetSchema.safeParse(values);
        const implausible = plausibilityWarnings(values as Record<string, unknown>).some(
          (w) => w.severity === "implausible",
        );
        if (parsed.success && !implausible) onValid({ ...parsed.data, label: set.label });
      },
    });
  }, [form, onValid, set.label]);

  return (
    <form
      noValidate
      onSubmit={(e) => e.preventDefault()}
      aria-label={`Values of set ${set.id}`}
      className="space-y-3"
    >
      {invalid.length > 0 ? (
        <p role="status" className="rounded border border-kiln bg-kiln-light/40 px-2 py-1 text-xs">
          {invalid.map(labelOf).join(", ")} {invalid.length === 1 ? "needs" : "need"} a valid value:
          the charts show the last valid values of set {set.id} until then.
        </p>
      ) : null}
      {GROUPS.map((g) => (
        <fieldset key={g.title} disabled={readOnly} className="space-y-1">
          <legend className="text-xs font-semibold uppercase tracking-wide text-ink-faint">
            {g.title}
          </legend>
          <div className="grid grid-cols-2 gap-x-3 gap-y-2">
            {g.symbols.map((symbol) => {
              const f = FIELD.get(symbol)!;
              const id = `param-${set.id}-${symbol}`;
              const error = (errors as Record<string, { message?: string } | undefined>)[symbol]
                ?.message;
              const name = symbol as keyof ParameterSetInput;
              const warning = error ? undefined : warnings.get(symbol);
              return (
                <div key={symbol} className="min-w-0">
                  <label
                    htmlFor={id}
                    className="flex items-baseline gap-1 text-sm"
                    title={f.meaning}
                  >
                    <span className="font-medium">{symbol}</span>
                    <span className="truncate text-xs">{f.label}</span>
                    {unitFor(f, law) ? (
                      <span className="truncate text-xs text-ink-faint">{unitFor(f, law)}</span>
                    ) : null}
                  </label>
                  {readOnly ? (
                    // Read-only: the value as text (same id, so the label still names it).
                    <output
                      id={id}
                      className={`mt-0.5 block w-full px-2 py-1 text-sm ${f.kind === "choice" ? "" : "font-mono"}`}
                    >
                      {shownValue(f, set[name])}
                    </output>
                  ) : f.kind === "choice" ? (
                    <select
                      id={id}
                      {...form.register(name)}
                      className="mt-0.5 w-full rounded border border-glaze-line bg-white px-2 py-1 text-sm"
                    >
                      {f.choices!.map((c) => (
                        <option key={c} value={c}>
                          {choiceText(f, c)}
                        </option>
                      ))}
                    </select>
                  ) : (
                    <input
                      id={id}
                      inputMode="decimal"
                      autoComplete="off"
                      placeholder={f.kind === "nullable-number" ? "off" : undefined}
                      aria-invalid={error ? true : undefined}
                      aria-describedby={`${id}-hint`}
                      {...withRoundedText(form.register(name, { setValueAs: toNumber(f) }), (el) =>
                        roundOnceShown(rounded, el, set[name]),
                      )}
                      className="mt-0.5 w-full rounded border border-glaze-line bg-white px-2 py-1 font-mono text-sm aria-[invalid]:border-kiln aria-[invalid]:bg-kiln-light/40"
                    />
                  )}
                  <p
                    id={`${id}-hint`}
                    className={`mt-0.5 text-xs ${error ? "text-kiln-dark" : "text-ink-faint"}`}
                  >
                    {error ? `${labelOf(symbol)} ${error}` : rangeFor(f, law)}
                  </p>
                  {warning ? (
                    <p className="mt-0.5 text-xs text-ochre-dark" data-testid={`${id}-warning`}>
                      {warning}
                    </p>
                  ) : null}
                </div>
              );
            })}
          </div>
        </fieldset>
      ))}
    </form>
  );
}
