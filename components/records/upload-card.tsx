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
import type { LayoutChoice } from "@/lib/csv/file-layout";
import type { Geometry, RecordMappingInput } from "@/lib/csv/record-mapping";
import { testRecordMetaSchema } from "@/lib/csv/record-schema";

import { CouponOrientationFields } from "./coupon-orientation-fields";

import { CurveChart } from "./curve-chart";
import { GeometryFields } from "./geometry-fields";
import { LayoutFields } from "./layout-fields";
import { MappingFields } from "./mapping-fields";
import { MetaFields, type MetaInput, type MetaOutput } from "./meta-fields";
import { postJson } from "./post-json";
import { PreviewTable } from "./preview-table";
import { useCsvPreview } from "../../workers/use-csv-preview";

export interface UploadCardProps {
  index: number;
  teamSlug: string;
  file: { name: string; text: string };
  onSaved: (name: string) => void;
  onRemove: () => void;
}

/**
 * One file of an upload: its layout (detected, changeable), the preview table, the columns (stress
 * and strain, or force and extension with the specimen's geometry), the converted curve, the
 * metadata, then the server's verdict. Saving stays off, with the reason in words, until the
 * curve can be made.
 */
export function UploadCard({ index, teamSlug, file, onSaved, onRemove }: UploadCardProps) {
  const [layout, setLayout] = useState<LayoutChoice>({});
  const [columns, setColumns] = useState<RecordMappingInput | undefined>(undefined);
  const [geometry, setGeometry] = useState<Geometry>({});
  const request: RecordMappingInput = { ...columns, geometry, layout };
  const result = useCsvPreview(file.text, request);
  const [serverError, setServerError] = useState<string | null>(null);
  const [coupon, setCoupon] = useState<CouponOrientationDraft | null>(null);
  const [couponError, setCouponError] = useState<string | undefined>(undefined);
  const form = useForm<MetaInput, unknown, MetaOutput>({
    resolver: zodResolver(testRecordMetaSchema),
    defaultValues: { testType: "tension-1", loading: "cyclic", specimenId: "", orientation: 0 },
  });
  const id = `upload-${index}`;
  const preview = result?.ok ? result.preview : null;
  const shown = preview?.mapping;
  const layoutShown = preview ?? (result && !result.ok && result.detected ? result : null);
  const whyNot = !preview
    ? null
    : (preview.missing ?? (preview.error ? "Fix the problem named above before saving." : null));
  const changeLayout = (next: LayoutChoice) => {
    setLayout(next);
    setColumns(undefined); // other lines give other columns: start from the new suggestion
  };

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
      {layoutShown?.detected && layoutShown.layout ? (
        <LayoutFields
          idPrefix={id}
          detected={layoutShown.detected}
          value={layoutShown.layout}
          onChange={changeLayout}
        />
      ) : null}
      {result && !result.ok ? <FieldError message={result.error.message} /> : null}
      {preview ? (
        <>
          <p className="text-sm text-ink-soft">
            {preview.rowCount} rows, delimiter “{preview.delimiter}”
            {preview.decimalComma ? ", decimal commas" : ""}.
          </p>
          <PreviewTable
            headers={preview.headers}
            rows={preview.firstRows}
            lines={preview.firstLines}
            rowCount={preview.rowCount}
          />
          <MappingFields
            idPrefix={id}
            headers={preview.headers}
            value={shown ?? {}}
            onChange={(next) => setColumns({ ...next, geometry: undefined, layout: undefined })}
          />
          <GeometryFields
            idPrefix={id}
            value={geometry}
            needsSection={shown?.stress === undefined && shown?.force !== undefined}
            needsGauge={shown?.strain === undefined && shown?.extension !== undefined}
            onChange={setGeometry}
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
            <div className="flex flex-wrap items-center gap-3">
              <Button
                type="submit"
                pending={form.formState.isSubmitting}
                disabled={!preview.curve}
                aria-describedby={whyNot ? `${id}-why-not` : undefined}
              >
                Save test record
              </Button>
              {whyNot ? (
                <p id={`${id}-why-not`} className="text-sm text-ink-soft">
                  {whyNot}
                </p>
              ) : null}
            </div>
          </form>
        </>
      ) : null}
    </li>
  );
}
