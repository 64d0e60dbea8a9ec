"use client";

import type { UseFormReturn } from "react-hook-form";
import type { z } from "zod";

import { Field } from "@/components/ui/field";
import { TEST_TYPES, type testRecordMetaSchema } from "@/lib/csv/record-schema";
import { TEST_TYPE_WORDS } from "@/lib/csv/test-type-words";

export type MetaInput = z.input<typeof testRecordMetaSchema>;
export type MetaOutput = z.output<typeof testRecordMetaSchema>;

const optionalNumber = { setValueAs: (v: string) => (v === "" ? undefined : Number(v)) };

/** Test type and specimen data of one upload (react-hook-form, lib/csv's zod schema). */
export function MetaFields({
  idPrefix,
  form,
}: {
  idPrefix: string;
  form: UseFormReturn<MetaInput, unknown, MetaOutput>;
}) {
  const { register, formState } = form;
  const err = (k: keyof MetaInput) => formState.errors[k]?.message as string | undefined;
  const select = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-2 text-sm";
  return (
    <fieldset className="grid gap-3 sm:grid-cols-3">
      <legend className="mb-2 text-sm font-medium">Test and specimen</legend>
      <label className="text-sm" htmlFor={`${idPrefix}-type`}>
        Test type
        <select id={`${idPrefix}-type`} className={select} {...register("testType")}>
          {TEST_TYPES.map((t) => (
            <option key={t} value={t}>
              {TEST_TYPE_WORDS[t]}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm" htmlFor={`${idPrefix}-loading`}>
        Loading
        <select id={`${idPrefix}-loading`} className={select} {...register("loading")}>
          <option value="cyclic">Cyclic</option>
          <option value="monotonic">Monotonic</option>
        </select>
      </label>
      <Field
        id={`${idPrefix}-specimen`}
        label="Specimen id"
        error={err("specimenId")}
        {...register("specimenId")}
      />
      <Field
        id={`${idPrefix}-orientation`}
        label="Orientation (° from axis 1)"
        type="number"
        step="any"
        error={err("orientation")}
        {...register("orientation", optionalNumber)}
      />
      <Field
        id={`${idPrefix}-rate`}
        label="Strain rate (1/s)"
        type="number"
        step="any"
        error={err("strainRate")}
        {...register("strainRate", optionalNumber)}
      />
      <Field
        id={`${idPrefix}-temperature`}
        label="Temperature (°C)"
        type="number"
        step="any"
        error={err("temperature")}
        {...register("temperature", optionalNumber)}
      />
      <Field
        id={`${idPrefix}-lab`}
        label="Laboratory"
        error={err("laboratory")}
        {...register("laboratory")}
      />
      <Field
        id={`${idPrefix}-notes`}
        label="Notes"
        className="sm:col-span-2"
        error={err("notes")}
        {...register("notes")}
      />
    </fieldset>
  );
}
