import { describe, expect, it } from "vitest";
import { PathRun } from "@/lib/mechanics/driver";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { expandPathDoc } from "@/lib/scenario/path-text/path-doc";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { runInChunks } from "@/lib/client/loading-desk/chunked-run";
import { presetByKey } from "@/lib/client/loading-desk/presets";
import { ResultBuffer, type ResultChunk } from "@/lib/client/loading-desk/result-buffer";
import { templateByKey } from "@/lib/client/loading-desk/templates";
import type { MaterialParams } from "@/lib/mechanics/types";

const demo = presetByKey("demo-smc")!.params as MaterialParams;

function legs(key: string) {
  const r = parsePathText(templateByKey(key)!.text);
  if (!r.ok) throw new Error("template");
  return expandPathDoc(r.doc);
}

/** A clock that moves 1 ms per reading, so chunking does not depend on the machine. */
function fakeClock() {
  let t = 0;
  return () => (t += 1);
}

describe("chunked run", () => {
  it("hands out every row once, in order, in several chunks, equal to one straight run", () => {
    const chunks: ResultChunk[] = [];
    const run = new PathRun(demo, legs("tension-unload-compression"));
    const status = runInChunks(run, (c) => chunks.push(c), {
      firstMs: 2,
      everyMs: 5,
      now: fakeClock(),
    });
    expect(chunks.length).toBeGreaterThan(2);
    const buf = new ResultBuffer(run.columns.increment.length);
    for (const c of chunks) buf.append(c);
    expect(buf.rows).toBe(251);
    const straight = new PathRun(demo, legs("tension-unload-compression"));
    straight.advance(1e9);
    for (const name of RESULT_COLUMNS)
      expect(Array.from(buf.columns[name].subarray(0, buf.rows))).toEqual(
        Array.from(straight.columns[name].subarray(0, straight.rows)),
      );
    expect(status.failed).toBe(false);
    // the unloading leg reaches zero stress and the compression leg goes below zero
    expect(buf.columns.sig11[150]).toBeCloseTo(0, 9);
    expect(buf.columns.sig11[250]).toBeLessThan(-50);
  });

  it("stops with the failure status when the path fails", () => {
    const chunks: ResultChunk[] = [];
    const status = runInChunks(new PathRun(demo, legs("uniaxial-tension")), (c) => chunks.push(c));
    expect(status.failed).toBe(true);
    const rows = chunks.reduce((s, c) => s + c.count, 0);
    expect(rows).toBeLessThan(201);
    expect(chunks[chunks.length - 1].columns.failed[chunks[chunks.length - 1].count - 1]).toBe(1);
  });
});
