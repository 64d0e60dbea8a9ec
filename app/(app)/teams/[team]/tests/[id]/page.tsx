import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { CouponOrientationView } from "@/components/records/coupon-orientation-view";
import { CurveChart } from "@/components/records/curve-chart";
import { getDb } from "@/db/index";
import { findTestRecordPoints, findTestRecordSummary } from "@/db/queries/test-records";
import { requireTeamRole } from "@/lib/server/access/guard";
import { conversionRows } from "@/lib/shared/records/conversion-words";
import { thinForDisplay } from "@/lib/shared/records/stored-points";

import { TeamNav } from "../../team-nav";
import { isUuid } from "@/lib/shared/uuid";

export const metadata: Metadata = { title: "Test record" };

export default async function TestRecordPage({
  params,
}: {
  params: Promise<{ team: string; id: string }>;
}) {
  const { team: slug, id } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  if (!isUuid(id)) notFound();
  const db = getDb();
  const record = await findTestRecordSummary(db, ctx.team.id, id);
  const points = record && (await findTestRecordPoints(db, ctx.team.id, id));
  if (!record || !points) notFound();
  const curve = thinForDisplay(points.strain, points.stress);
  const rows: [string, string][] = [
    ["Test type", `${record.testType}, ${record.loading}`],
    ["Specimen", record.specimenId],
    ["Orientation", `${record.orientation}°`],
    ["Strain rate", record.strainRate === null ? "—" : `${record.strainRate} 1/s`],
    ["Temperature", record.temperature === null ? "—" : `${record.temperature} °C`],
    ["Laboratory", record.laboratory ?? "—"],
    ["Units read", `strain ${record.mapping.strainUnit}, stress ${record.mapping.stressUnit}`],
    ...conversionRows(record.mapping),
    ["Points", record.pointCount.toLocaleString("en")],
    ["File", `${record.fileName} (${record.fileSize.toLocaleString("en")} bytes)`],
    ["SHA-256", record.fileSha256],
    [
      "Uploaded",
      `${record.createdAt.slice(0, 10)} by ${record.createdBy?.name ?? "former member"}`,
    ],
  ];
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <h2 className="font-display text-2xl font-semibold">{record.name}</h2>
      {record.notes ? <p className="mt-2 text-sm text-ink-soft">{record.notes}</p> : null}
      <div className="mt-6 grid gap-6 md:grid-cols-[2fr_1fr]">
        <CurveChart testId="record-curve" traces={[{ name: record.name, ...curve }]} />
        <dl className="space-y-1 text-sm">
          {rows.map(([k, v]) => (
            <div key={k} className="flex justify-between gap-3 border-b border-glaze-line py-1">
              <dt className="text-ink-soft">{k}</dt>
              <dd className="break-all text-right">{v}</dd>
            </div>
          ))}
        </dl>
      </div>
      {record.couponOrientation ? (
        <CouponOrientationView orientation={record.couponOrientation} />
      ) : null}
      {record.warnings.map((w) => (
        <p key={w} className="mt-3 rounded bg-amber-50 px-3 py-2 text-sm text-amber-900">
          {w}
        </p>
      ))}
      <a
        href={`/api/v1/teams/${ctx.team.slug}/test-records/${record.id}/file`}
        className="mt-6 inline-block text-sm text-verdigris-dark hover:underline"
        download
      >
        Download the original file
      </a>
    </>
  );
}
