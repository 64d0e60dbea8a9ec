import fc from "fast-check";

import { DEMO_FILE, type World } from "../support/workspace";

// Generators of hostile requests: path parameters, query strings and bodies that are wrong in
// shape, type, size and encoding, mixed with real ids so the deeper layers get reached too.

const NASTY = [
  "",
  "0",
  "-1",
  "1e309",
  "NaN",
  "9".repeat(40),
  "../../etc/passwd",
  "%00",
  "\u0000",
  "' OR 1=1 --",
  "<script>alert(1)</script>",
  "00000000-0000-0000-0000-000000000000",
  "\ud800",
  "🧪".repeat(50),
];

const text = fc.oneof(
  fc.constantFrom(...NASTY),
  fc.string({ maxLength: 60 }),
  fc.string({ unit: "binary", maxLength: 30 }),
  fc.uuid(),
  fc.integer().map(String),
);

/** The world's real value for a path parameter, where it has one. */
function realParam(w: World, name: string): string | undefined {
  const known: Record<string, string> = {
    team: w.slug,
    scenario: w.scenarioId,
    number: "1",
    comment: w.commentId,
    link: w.linkId,
    set: w.setId,
    token: w.token,
  };
  return known[name];
}

export function paramsArb(w: World, names: string[]): fc.Arbitrary<Record<string, string>> {
  const entries = names.map((name) => {
    const real = realParam(w, name);
    // Mostly real ids, so a bad body or query meets a route that would otherwise succeed.
    const arb =
      real === undefined
        ? text
        : fc.oneof({ weight: 3, arbitrary: fc.constant(real) }, { weight: 1, arbitrary: text });
    return [name, arb] as const;
  });
  return fc.record(Object.fromEntries(entries));
}

const QUERY_KEYS = [
  "page",
  "pageSize",
  "sort",
  "dir",
  "tag",
  "review",
  "author",
  "q",
  "from",
  "to",
  "scenario",
  "download",
  "format",
  "rev",
];

export const queryArb = fc
  .dictionary(fc.oneof(fc.constantFrom(...QUERY_KEYS), fc.string({ maxLength: 8 })), text, {
    maxKeys: 5,
  })
  .map((q) => new URLSearchParams(q).toString());

/** A valid scenario file with one value somewhere inside replaced by junk. */
const mutatedFile = fc.tuple(fc.nat(), fc.jsonValue({ maxDepth: 2 })).map(([pick, junk]) => {
  const file = structuredClone(DEMO_FILE) as unknown as Record<string, unknown>;
  const set = (file.parameterSets as Record<string, unknown>[])[0];
  const targets: [Record<string, unknown>, string][] = [
    ...Object.keys(set).map((k) => [set, k] as [Record<string, unknown>, string]),
    ...Object.keys(file).map((k) => [file, k] as [Record<string, unknown>, string]),
  ];
  const [holder, key] = targets[pick % targets.length];
  holder[key] = junk;
  return file;
});

const plausibleBody = fc.record(
  {
    name: fc.oneof(text, fc.jsonValue({ maxDepth: 1 })),
    body: fc.oneof(text, fc.jsonValue({ maxDepth: 1 })),
    message: text,
    baseRevision: fc.oneof(fc.integer(), fc.double(), text),
    file: fc.oneof(mutatedFile, fc.jsonValue({ maxDepth: 2 })),
    action: fc.oneof(fc.constantFrom("request", "approve", "request-changes"), text),
    reviewers: fc.oneof(fc.array(fc.uuid(), { maxLength: 3 }), fc.jsonValue({ maxDepth: 1 })),
    values: fc.jsonValue({ maxDepth: 2 }),
    tags: fc.array(text, { maxLength: 5 }),
    expiresInDays: fc.oneof(fc.integer(), text),
    parentId: text,
    text: text,
    mapping: fc.jsonValue({ maxDepth: 2 }),
    meta: fc.jsonValue({ maxDepth: 2 }),
  },
  { requiredKeys: [] },
);

/** A raw request body: JSON of any shape, almost-JSON, or nothing at all. */
export const bodyArb: fc.Arbitrary<string | undefined> = fc.oneof(
  plausibleBody.map((b) => JSON.stringify(b)),
  fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)),
  fc.string({ maxLength: 80 }),
  fc.constantFrom(undefined, "", "{", "null", '{"__proto__":{"x":1}}', "[".repeat(5000)),
);
