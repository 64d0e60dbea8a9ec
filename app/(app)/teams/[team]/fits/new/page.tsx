import type { Metadata } from "next";

import { CalibrationWorkspace } from "@/components/calibration/calibration-workspace";
import { getDb } from "@/db/index";
import { listTestRecordsForTeam } from "@/db/queries/test-records";
import { requireTeamRole } from "@/lib/server/access/guard";

import { TeamNav } from "../../team-nav";

export const metadata: Metadata = { title: "New calibration" };

export default async function NewFitPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "fit:run");
  const records = await listTestRecordsForTeam(getDb(), ctx.team.id);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <h2 className="mb-6 font-display text-2xl font-semibold">Calibrate from test records</h2>
      <CalibrationWorkspace slug={ctx.team.slug} records={records} />
    </>
  );
}
