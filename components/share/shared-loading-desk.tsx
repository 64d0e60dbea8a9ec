"use client";

import { LoadingDesk } from "@/components/loading-desk/loading-desk";
import type { OpenedScenario } from "@/lib/client/loading-desk/scenario-state";

export interface SharedLoadingDeskProps {
  scenario: OpenedScenario;
  /** The team that shared the revision: its editors and owners may change it. */
  teamName?: string;
}

/** The loading desk, read-only: charts, results table and export, nothing saved anywhere. */
export function SharedLoadingDesk({ scenario, teamName }: SharedLoadingDeskProps) {
  return <LoadingDesk initialScenario={scenario} readOnly teamName={teamName} />;
}
