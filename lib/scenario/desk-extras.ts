/**
 * The scenario file's top-level "desk" field: what the loading desk keeps beside the schema (the
 * path text as typed, the hidden sets). Files saved before the rename call it "workbench"; stored
 * revisions stay as they were written, so readers take either name.
 */
export function readDeskExtras(file: unknown): unknown {
  if (file === null || typeof file !== "object") return undefined;
  const record = file as { desk?: unknown; workbench?: unknown };
  return record.desk ?? record.workbench;
}
