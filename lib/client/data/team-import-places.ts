// Where in a team export a problem sits, in words: "revision 3 of 'Plate rib'" and "scenario
// file" rather than scenarios[0].revisions[2].file. Reads names from the raw file, which may be
// broken anywhere, so every step tolerates missing or wrong types.

export type PlaceDoc = Record<string, unknown> | null | undefined;

const FIELD_WORDS: Record<string, string> = {
  format: "format",
  exportedAt: "export date",
  team: "team",
  slug: "address",
  name: "name",
  email: "e-mail",
  parameterSets: "parameter sets",
  scenarios: "scenarios",
  values: "values",
  provenance: "provenance",
  createdBy: "creator",
  updatedBy: "last editor",
  createdAt: "creation date",
  updatedAt: "last-change date",
  editedAt: "edit date",
  materialLabel: "material label",
  tags: "tags",
  revisions: "revisions",
  number: "revision number",
  author: "author",
  message: "message",
  file: "scenario file",
  review: "review",
  state: "state",
  by: "reviewer",
  at: "date",
  reviewEvents: "review history",
  from: "previous state",
  to: "new state",
  actor: "person",
  note: "note",
  comments: "comments",
  key: "key",
  parentKey: "reply link",
  body: "text",
  increment: "increment",
  testRecords: "test records",
  fits: "fits",
  recordKeys: "records",
  specimenId: "specimen id",
  points: "points",
  mapping: "column mapping",
  sha256: "sha-256 checksum",
  params: "values",
  couponOrientation: "coupon orientation",
};

function wordOf(key: PropertyKey): string {
  if (typeof key === "number") return `entry ${key + 1}`;
  return FIELD_WORDS[String(key)] ?? String(key);
}

const PEOPLE = new Set(["creator", "last editor", "author", "reviewer", "person"]);

/** "creator's e-mail", "reviewer's name" (review.by.name), "review state", "tags entry 2". */
function fieldOf(rest: readonly PropertyKey[]): string {
  const words = rest.map(wordOf);
  // review.by reads as "reviewer", not "review reviewer".
  if (words[0] === "review" && words[1] === "reviewer") words.shift();
  const out: string[] = [];
  words.forEach((word, n) => {
    out.push(PEOPLE.has(word) && n < words.length - 1 ? `${word}'s` : word);
  });
  return out.join(" ");
}

function itemAt(list: unknown, index: unknown): Record<string, unknown> | undefined {
  if (!Array.isArray(list) || typeof index !== "number") return undefined;
  const item: unknown = list[index];
  return typeof item === "object" && item !== null ? (item as Record<string, unknown>) : undefined;
}

function named(item: Record<string, unknown> | undefined, kind: string, index: number): string {
  const name = typeof item?.name === "string" ? item.name.trim() : "";
  return name ? `${kind} '${name}'` : `${kind} ${index + 1} in the file`;
}

export interface Place {
  /** The thing the problem belongs to: "revision 3 of 'Plate rib'". */
  where: string;
  /** The field of that thing in words, "" for the thing itself. */
  field: string;
}

export function describePlace(path: readonly PropertyKey[], doc: PlaceDoc): Place {
  const [top, i, ...rest] = path;
  if (top === "parameterSets" && typeof i === "number") {
    const set = itemAt(doc?.parameterSets, i);
    return { where: named(set, "parameter set", i), field: fieldOf(rest) };
  }
  if (top === "scenarios" && typeof i === "number") {
    const scenario = itemAt(doc?.scenarios, i);
    const scenarioWords = named(scenario, "scenario", i);
    // Inside a scenario its name is enough: "revision 3 of 'Plate rib'".
    const ofScenario = scenarioWords.replace(/^scenario '/, "'");
    const [sub, j, ...inner] = rest;
    if (sub !== "revisions" || typeof j !== "number") {
      return { where: scenarioWords, field: fieldOf(rest) };
    }
    const revision = itemAt(scenario?.revisions, j);
    const n = revision?.number;
    const revisionWords =
      typeof n === "number" && Number.isInteger(n)
        ? `revision ${n} of ${ofScenario}`
        : `revision ${j + 1} in the list of ${ofScenario}`;
    const [list, k, ...leaf] = inner;
    if (list === "comments" && typeof k === "number") {
      return { where: `comment ${k + 1} on ${revisionWords}`, field: fieldOf(leaf) };
    }
    if (list === "reviewEvents" && typeof k === "number") {
      return { where: `review history entry ${k + 1} of ${revisionWords}`, field: fieldOf(leaf) };
    }
    return { where: revisionWords, field: fieldOf(inner) };
  }
  if (top === "testRecords" && typeof i === "number") {
    const record = itemAt(doc?.testRecords, i);
    return { where: named(record, "test record", i), field: fieldOf(rest) };
  }
  if (top === "fits" && typeof i === "number") {
    return { where: `fit ${i + 1} in the file`, field: fieldOf(rest) };
  }
  if (top === "team") return { where: "the file", field: fieldOf(["team", ...path.slice(1)]) };
  return { where: "the file", field: fieldOf(path) };
}
