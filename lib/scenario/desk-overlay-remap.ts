/**
 * A team import gives every test record a new id, so the overlays a revision's "desk" field
 * names (record ids of the exporting team) are rewritten to the new ids. An overlay whose record
 * did not travel with the file would point at nothing in the new team: it is dropped, and the
 * caller tells the person which one. Pure; the file is copied, never changed in place.
 */
import { type DeskOverlay, readDeskOverlays } from "./desk-extras";

export interface RemappedOverlays {
  file: Record<string, unknown>;
  /** Overlays whose record is not among the new ids, in the order the file listed them. */
  dropped: DeskOverlay[];
}

/** `newIdOf` maps old record ids (lower case) to new ones. */
export function remapDeskOverlays(
  file: Record<string, unknown>,
  newIdOf: ReadonlyMap<string, string>,
): RemappedOverlays {
  // Readers take the old name "workbench" too; the rewritten field keeps the name it had.
  const field = file.desk !== undefined ? "desk" : "workbench";
  const extras = file[field];
  if (extras === null || typeof extras !== "object" || Array.isArray(extras)) {
    return { file, dropped: [] };
  }
  if (!("overlays" in extras)) return { file, dropped: [] };
  const kept: DeskOverlay[] = [];
  const dropped: DeskOverlay[] = [];
  for (const overlay of readDeskOverlays(extras)) {
    const recordId = newIdOf.get(overlay.recordId);
    if (recordId) kept.push({ recordId, name: overlay.name });
    else dropped.push(overlay);
  }
  return { file: { ...file, [field]: { ...extras, overlays: kept } }, dropped };
}

/** The import summary's note for a dropped overlay, in the person's words. */
export function droppedOverlayNote(
  scenarioName: string,
  revisionNumber: number,
  overlay: DeskOverlay,
): string {
  const record = overlay.name ? `'${overlay.name}'` : "a test record";
  return `Revision ${revisionNumber} of '${scenarioName}' drew ${record} over its charts; that record is not in the file, so the overlay is left out.`;
}
