/**
 * Scans the sources of user-facing text (pages, components, shared messages, e-mail templates,
 * report and bundle note, OpenAPI descriptions, the command line) for words issue 16 retired:
 * "workbench", "step" counting increments, sig11/eps11 in prose, internal section references.
 * Comments are skipped (they are for developers); the few legitimate uses are listed by file.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const ROOTS = [
  "app",
  "components",
  "lib/shared",
  "lib/server/email",
  "lib/server/handoff",
  "lib/scenario/drive-command.ts",
  "lib/scenario/drive-args.ts",
  "lib/scenario/issue-messages.ts",
  "scripts/drive.ts",
];

interface Rule {
  name: string;
  /** Tested against the string literals and JSX text of a line that is not a comment. */
  pattern: RegExp;
  /** Files (relative paths) where the match is legitimate, with the reason. */
  allowed?: Record<string, string>;
}

const RULES: readonly Rule[] = [
  {
    name: "workbench",
    pattern: /workbench/i,
    allowed: {},
  },
  {
    name: "step as a count of increments",
    pattern: /\bsteps? \d|\bat step\b|\bsteps?\b.*\bincrements?\b|\bstep cursor\b/i,
  },
  {
    name: "sig11/eps11 in prose",
    // An ASCII component name inside a sentence (a literal with a space): column lists excepted.
    pattern: /^(?=.*\s).*\b(sig|eps)(11|22|12)\b/,
    allowed: {
      "lib/server/handoff/bundle/note.ts":
        "names the contract CSV's ASCII columns beside the symbols",
      "lib/server/handoff/conformance/read-history.ts":
        "tells which ASCII column names the upload reads",
      "components/conformance/upload-form.tsx": "lists the ASCII column names of the upload",
    },
  },
  { name: "internal section reference", pattern: /\bspec [A-E](\.\d+)?\b|\bper spec\b/ },
];

/** The user-visible parts of a line: string literals and JSX text; comment lines yield nothing. */
export function textsOf(line: string): string[] {
  const t = line.trim();
  if (t.startsWith("//") || t.startsWith("*") || t.startsWith("/*")) return [];
  const code = line.replace(/\s\/\/ .*$/, "");
  const literals = [
    ...code.matchAll(/"([^"\\]*(?:\\.[^"\\]*)*)"|'([^'\\]*(?:\\.[^'\\]*)*)'|`([^`]*)`/g),
  ].map((m) => m[1] ?? m[2] ?? m[3] ?? "");
  const jsxText = [...code.matchAll(/>([^<>{}]+)</g)].map((m) => m[1]);
  const bare = /^[^"'`<>{}=;()]+$/.test(t) && /\s/.test(t) ? [t] : [];
  return [...literals, ...jsxText, ...bare];
}

export function findForbidden(file: string, source: string): string[] {
  const hits: string[] = [];
  source.split("\n").forEach((line, i) => {
    for (const text of textsOf(line)) {
      for (const rule of RULES) {
        if (rule.allowed && file in rule.allowed) continue;
        if (rule.pattern.test(text)) hits.push(`${file}:${i + 1} ${rule.name}: ${text.trim()}`);
      }
    }
  });
  return hits;
}

function filesUnder(path: string): string[] {
  if (statSync(path).isFile()) return [path];
  return readdirSync(path).flatMap((name) => filesUnder(join(path, name)));
}

const SOURCES = ROOTS.flatMap(filesUnder).filter((f) => /\.(ts|tsx|txt|md|html)$/.test(f));

describe("user-facing text holds none of the retired words", () => {
  it("finds nothing in the product's text sources", () => {
    expect(SOURCES.length).toBeGreaterThan(50);
    const hits = SOURCES.flatMap((f) => findForbidden(f, readFileSync(f, "utf8")));
    expect(hits).toEqual([]);
  });

  it("catches a planted example of each rule", () => {
    const planted = [
      'const t = "Loading the Workbench…";',
      "const m = `failed at step 106`;",
      "<p>Step cursor</p>",
      'const n = "stress sig11 against strain";',
      'const u = "read as percent (spec E.1)";',
    ].join("\n");
    expect(findForbidden("components/planted.tsx", planted)).toHaveLength(5);
  });

  it("leaves comments, code identifiers and the listed column names alone", () => {
    const fine = [
      "// at step 3 of spec E.1 the workbench …",
      "const x = run.columns.sig11;",
      'const y = useState("eps11");',
      '"load step" is the finite-element term, not ours',
    ].join("\n");
    expect(findForbidden("components/fine.tsx", fine)).toEqual([]);
    expect(
      findForbidden("components/conformance/upload-form.tsx", "<p>CSV: eps11, sig11 and d1</p>"),
    ).toEqual([]);
  });
});
