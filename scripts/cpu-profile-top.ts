/**
 * Sums V8 CPU profiles (`node --cpu-prof`) by function and by package, for one phase of
 * bench:api. Run: npx tsx scripts/cpu-profile-top.ts DIR [PHASE] [N]
 * DIR holds the .cpuprofile files of every app process and the phases.json bench:api writes
 * there when BENCH_CPU_PROF_DIR=DIR is set; PHASE (list, save, floor) keeps only the samples
 * taken in that phase's window. Prints self time per request, so phases of different length
 * compare directly.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
}
interface Profile {
  nodes: ProfileNode[];
  startTime: number;
  endTime: number;
  samples: number[];
  timeDeltas: number[];
}
interface PhaseWindow {
  name: string;
  requests: number;
  startedUs: number;
  endedUs: number;
}

const [dir, phaseName, top = "30"] = process.argv.slice(2);
if (!dir) {
  console.error("usage: tsx scripts/cpu-profile-top.ts DIR [PHASE] [N]");
  process.exit(2);
}
const phases: PhaseWindow[] = JSON.parse(readFileSync(path.join(dir, "phases.json"), "utf8"));
const phase = phaseName ? phases.find((p) => p.name === phaseName) : undefined;
if (phaseName && !phase) throw new Error(`no phase ${phaseName} in phases.json`);

/** Where the code lives: a package under node_modules, a Next chunk, node itself, or ours. */
function placeOf(url: string): string {
  const modules = url.lastIndexOf("node_modules/");
  if (modules >= 0) {
    const rest = url.slice(modules + "node_modules/".length).split("/");
    return rest[0].startsWith("@") ? `${rest[0]}/${rest[1]}` : rest[0];
  }
  if (url.includes("/.next-bench/")) return "app build (.next-bench)";
  if (url.startsWith("node:") || url === "") return url || "(native or V8)";
  return path.relative(process.cwd(), url.replace(/^file:\/\//, ""));
}

const byFunction = new Map<string, number>();
const byPlace = new Map<string, number>();
let totalUs = 0;
for (const file of readdirSync(dir).filter((f) => f.endsWith(".cpuprofile"))) {
  const profile: Profile = JSON.parse(readFileSync(path.join(dir, file), "utf8"));
  const nodes = new Map(profile.nodes.map((n) => [n.id, n.callFrame]));
  let t = profile.startTime;
  for (let i = 0; i < profile.samples.length; i++) {
    t += profile.timeDeltas[i];
    // A sample stands for the time until the next one.
    const dt = profile.timeDeltas[i + 1] ?? 0;
    if (phase && (t < phase.startedUs || t > phase.endedUs)) continue;
    const frame = nodes.get(profile.samples[i])!;
    // Idle is waiting for work; "(program)" (native code) and "(garbage collector)" count.
    if (frame.functionName === "(idle)") continue;
    const name = `${frame.functionName || "(anonymous)"} ${placeOf(frame.url)}:${frame.lineNumber + 1}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + dt);
    const place = frame.url ? placeOf(frame.url) : frame.functionName;
    byPlace.set(place, (byPlace.get(place) ?? 0) + dt);
    totalUs += dt;
  }
}

const perRequest = (us: number) => (phase ? us / 1000 / phase.requests : us / 1000);
const unit = phase ? "ms per request" : "ms";
const show = (title: string, table: Map<string, number>) => {
  console.log(`\n${title} (self time, ${unit})`);
  for (const [name, us] of [...table].sort((a, b) => b[1] - a[1]).slice(0, Number(top))) {
    console.log(`${perRequest(us).toFixed(3).padStart(9)}  ${name}`);
  }
};
console.log(
  `${phase ? `phase ${phase.name}, ${phase.requests} requests` : "whole run"}: ${perRequest(totalUs).toFixed(2)} ${unit} of busy samples`,
);
show("by package or file", byPlace);
show("by function", byFunction);
