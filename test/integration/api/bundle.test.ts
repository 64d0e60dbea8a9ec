import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

import JSZip from "jszip";
import { beforeAll, describe, expect, it } from "vitest";

import * as bundleRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/bundle/route";
import { CSV_HEADER } from "@/lib/scenario/results-csv";

import { openTestDb } from "../support/db";
import {
  closeAppPoolAfterAll,
  cookieFor,
  DEMO_FILE,
  makeWorld,
  type World,
} from "../support/workspace";
import { bearer, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

const CASES = [
  "tension-1",
  "tension-2",
  "compression-1",
  "shear-12",
  "cycles-1",
  "tension-unload-compression-1",
];

let w: World;
let other: World;
let token: string;

beforeAll(async () => {
  w = await makeWorld(db);
  other = await makeWorld(db);
  token = (await tokenFor(db, w.members.viewer, w.slug, "viewer")).token;
});

async function fetchBundle(headers: Record<string, string>, scenario = w.scenarioId) {
  const request = new Request("http://app.test/x", { headers });
  return bundleRoute.GET(request, {
    params: Promise.resolve({ team: w.slug, scenario, number: "1" }),
  });
}

describe("reference bundle", () => {
  it("zips the scenario file, every standard case per set as file and curve, and the note", async () => {
    const res = await fetchBundle(bearer(token));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/zip");
    const zip = await JSZip.loadAsync(await res.arrayBuffer());
    const read = (name: string) => zip.file(`reference-bundle/${name}`)!.async("string");
    expect(JSON.parse(await read("scenario.json"))).toEqual(DEMO_FILE);
    const setIds = DEMO_FILE.parameterSets.map(
      (s, i) => (s.id as string) ?? String.fromCharCode(65 + i),
    );
    for (const set of setIds) {
      for (const c of CASES) {
        const csv = await read(`curves/${set}/${c}.csv`);
        const lines = csv.trim().split("\n");
        expect(lines[0]).toBe(CSV_HEADER);
        expect(lines.length).toBeGreaterThan(100);
        expect(zip.file(`reference-bundle/cases/${set}/${c}.json`)).not.toBeNull();
      }
      // Damage grows in tension along 1 and stays zero in compression (closure).
      const tension = (await read(`curves/${set}/tension-1.csv`))
        .trim()
        .split("\n")
        .at(-1)!
        .split(",");
      expect(Number(tension[8])).toBeGreaterThan(0);
    }
    const note = await read("README.txt");
    expect(note).toContain("no design allowable");
    expect(note).toContain(CSV_HEADER);
    expect(note).toMatch(/1 % of the peak stress/);
    expect(note).toMatch(/0\.005 absolute/);
  });

  it("holds curves the command-line driver reproduces from the bundled case files", async () => {
    const zip = await JSZip.loadAsync(await (await fetchBundle(bearer(token))).arrayBuffer());
    const set = (DEMO_FILE.parameterSets[0].id as string) ?? "A";
    const dir = mkdtempSync(path.join(tmpdir(), "bundle-"));
    const caseFile = path.join(dir, "case.json");
    writeFileSync(
      caseFile,
      await zip.file(`reference-bundle/cases/${set}/cycles-1.json`)!.async("string"),
    );
    const fromDriver = execFileSync("npm", ["run", "--silent", "drive", "--", caseFile], {
      encoding: "utf8",
    });
    expect(await zip.file(`reference-bundle/curves/${set}/cycles-1.csv`)!.async("string")).toBe(
      fromDriver,
    );
  });

  it("answers 404 to outsiders and for another team's revision, 401 to a revoked or unknown token", async () => {
    const outsider = await cookieFor(db, w.outsider);
    expect((await fetchBundle({ cookie: outsider! })).status).toBe(404);
    expect((await fetchBundle(bearer(token), other.scenarioId)).status).toBe(404);
    expect((await fetchBundle(bearer(`crq_${"B".repeat(43)}`))).status).toBe(401);
  });
});
