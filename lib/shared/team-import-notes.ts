import { droppedOverlayNote, remapDeskOverlays } from "@/lib/scenario/desk-overlay-remap";
import type { TeamExport } from "@/lib/shared/validations/team-export";

/**
 * What a team import leaves out, in the person's words: overlays of test records the file does
 * not carry, and a fit's links to records or a parameter set that are not in it. The import page
 * shows these before the upload and the server answers with the same list after it.
 */
export function teamImportNotes(doc: TeamExport): string[] {
  const keys = new Set(doc.testRecords.map((r) => r.key.toLowerCase()));
  const asIs = new Map([...keys].map((k) => [k, k]));
  const notes: string[] = [];
  for (const scenario of doc.scenarios) {
    for (const revision of scenario.revisions) {
      for (const overlay of remapDeskOverlays(revision.file, asIs).dropped) {
        notes.push(droppedOverlayNote(scenario.name, revision.number, overlay));
      }
    }
  }
  const setNames = new Set(doc.parameterSets.map((s) => s.name));
  doc.fits.forEach((fit, i) => {
    const missing = fit.recordKeys.filter((k) => !keys.has(k.toLowerCase())).length;
    if (missing > 0) {
      const records = missing === 1 ? "a test record that is" : `${missing} test records that are`;
      notes.push(
        `Fit ${i + 1} used ${records} not in the file (deleted before the export); it keeps the others.`,
      );
    }
    if (fit.parameterSet !== null && !setNames.has(fit.parameterSet)) {
      notes.push(
        `Fit ${i + 1} was saved as parameter set '${fit.parameterSet}', which is not in the file; the fit is kept without it.`,
      );
    }
  });
  return notes;
}
