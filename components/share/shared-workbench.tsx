"use client";

import { Workbench } from "@/components/workbench/workbench";
import type { OpenedScenario } from "@/lib/client/workbench/scenario-state";

export interface SharedWorkbenchProps {
  scenario: OpenedScenario;
}

/** The workbench, read-only: charts, results table and export, nothing saved anywhere. */
export function SharedWorkbench({ scenario }: SharedWorkbenchProps) {
  return <Workbench initialScenario={scenario} readOnly />;
}
