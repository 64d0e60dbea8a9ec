"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";

import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import {
  readCouponOrientation,
  type CouponOrientationDraft,
} from "@/lib/calibration/micromechanics/coupon-orientation";
import { testRecordMetaSchema, type ColumnMappingInput } from "@/lib/csv/record-schema";

import { CouponOrientationFields } from "./coupon-orientation-fields";

import { CurveChart } from "./curve-chart";
import { MappingFields } from "./mapping-fields";
import { MetaFields, type MetaInput, type MetaOutput } from "./meta-fields";
import { postJson } from "./post-json";
import { useCsvPreview } from "../../workers/use-csv-preview";

export interface UploadCardProps {
  index: number;
  teamSlug: string;
  file: { name: string; text: string };
  onSaved: (name: string) => void;
  onRemove: () => void;
}

/** One file of an upload: preview, column mapping, metadata, then the server's verdict. */
export function UploadCard({ index, teamSlug, file, onSaved, onRemove }: UploadCardProps) {
  const [mapping, setMapping] = useState<ColumnMappingInput | undefined>(undefined);
  const result = useCsvPreview(file.text, mapping);
  const [serverError, setServerError] = useState<string | null>(null);
  const [coupon, setCoupon] = useState<CouponOrientationDraft | null>(null);
  const [couponError, setCouponError] = useState<string | undefined>(undefined);
  const form = useForm<MetaInput, unknown, MetaOutput>({
    resolver: zodResolver(testRecordMetaSchema),
    defaultValues: { testType: "tension-1", loading: "cyclic", specimenId: "", orientation: 0 },
  });
  const id = `upload-${index}`;
  const preview = result?.ok ? result.preview : null;
  const shown = mapping ?? (preview?.suggested as ColumnMappingInput | undefined);

  const submit = form.handleSubmit(async (meta) => {
    setServerError(null);
    const read = coupon ? readCouponOrientation(coupon) : null;
    setCouponError(read && !read.ok ? read.message : undefined);
    if (read && !read.ok) return;
    const withCoupon = read ? { ...meta, couponOrientation: read.value } : meta;
    const body = { fileName: file.name, text: file.text, mapping: shown, meta: withCoupon };
    const res = await postJson(`/api/v1/teams/${teamSlug}/test-records`, body);
    if (res.ok) onSaved(file.name);
    else setServerError(res.message);
  });

  return (
    <li
      className="space-y-4 rounded-lg border border-glaze-line bg-white/70 p-4"
      data-testid="upload-card"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h3 className="font-medium">{file.name}</h3>
        <button type="button" className="text-sm text-ink-soft hover:underline" onClick={onRemove}>
          Remove
        </button>
      </div>
      {result === null ? <p className="text-sm text-ink-soft">Reading the file…</p> : null}
      {result && !result.ok ? <FieldError message={result.error.message} /> : null}
      {preview ? (
        <>
          <p className="text-sm text-ink-soft">
            {preview.rowCount} rows, delimiter “{preview.delimiter}”
            {preview.decimalComma ? ", decimal commas" : ""}.
          </p>
          <MappingFields
            idPrefix={id}
            headers={preview.headers}
            value={shown ?? { strain: 0, stress: 1 }}
            onChange={setMapping}
          />
          {preview.error ? <FieldError message={preview.error.message} /> : null}
          {preview.warnings.map((w) => (
            <p
              key={w}
              role="status"
              className="rounded bg-amber-50 px-3 py-2 text-sm text-amber-900"
            >
              {w}
            </p>
          ))}
          {preview.curve ? (
            <CurveChart
              height={240}
              traces={[{ name: file.name, x: preview.curve.x, y: preview.curve.y }]}
            />
          ) : null}
          <form onSubmit={submit} className="space-y-4" noValidate>
            <MetaFields idPrefix={id} form={form} />
            <CouponOrientationFields
              idPrefix={id}
              value={coupon}
              onChange={setCoupon}
              error={couponError}
            />
            <FieldError message={serverError ?? undefined} />
            <Button type="submit" pending={form.formState.isSubmitting} disabled={!preview.curve}>
              Save test record
            </Button>
          </form>
        </>
      ) : null}
    </li>
  );
}
