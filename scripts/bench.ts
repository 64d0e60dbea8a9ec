/**
 * Benchmark of the numerical core: user increments per second (median of 5 runs after a
 * warm-up) for three paths, and the bytes the result columns hold per stored increment.
 * The rate is counted on the CPU time the process spent on the run (user + system, so the
 * kernel's first touch of the result columns counts too): the goal is a rate on one core, and
 * on a shared machine the wall clock also counts the time other programs held the core. The
 * wall-clock rates are printed beside it.
 * Last line, exactly: `bench: elastic=<n>/s damaging=<n>/s biaxial=<n>/s bytesPerIncrement=<n>`.
 * Needs nothing but the source tree (no database). Run: `npm run bench`.
 */
import { performance } from "node:perf_hooks";
import { DEMO_SMC } from "../lib/mechanics/demo-set";
import { SET_A } from "../test/fixtures/set-a";
import { runPath } from "../lib/mechanics/driver";
import { RESULT_COLUMNS, type Leg, type MaterialParams } from "../lib/mechanics/types";

const RUNS = 5;

/** Spec A.3 demo SMC set [I]. */
const DEMO: MaterialParams = DEMO_SMC;

/** An orthotropic short-fibre set (spec D.14 set A) with its damage axes at 30° to the load axes. */
const ROTATED: MaterialParams = { ...SET_A, thetaD: 30 };

interface Case {
  name: "elastic" | "damaging" | "biaxial";
  params: MaterialParams;
  legs: Leg[];
}

const uniaxialStrain = (e: number, n: number): Leg => ({
  control: ["strain", "stress", "stress"],
  target: [e, 0, 0],
  increments: n,
});

const uniaxialStress = (s: number, n: number): Leg => ({
  control: ["stress", "stress", "stress"],
  target: [s, 0, 0],
  increments: n,
});

/**
 * Peaks ε11 = 0.004 … 0.014 (below dcrit's 0.01538, spec D.4). Each cycle: elastic reload to the
 * previous peak in few increments, damaging push to the new peak in many, stress-controlled
 * unloading to 0, compression to −0.003, back to zero stress.
 */
function growingCycles(): Leg[] {
  const legs: Leg[] = [];
  let previousPeak = 0.002;
  for (let peak = 0.004; peak < 0.0145; peak += 0.002) {
    legs.push(uniaxialStrain(previousPeak, 2_000), uniaxialStrain(peak, 60_000));
    legs.push(uniaxialStress(0, 2_000), uniaxialStrain(-0.003, 2_000), uniaxialStress(0, 2_000));
    previousPeak = peak;
  }
  return legs;
}

const CASES: Case[] = [
  {
    // (i) below the threshold strain 0.003015 (spec D.4): every increment is elastic.
    name: "elastic",
    params: DEMO,
    legs: [uniaxialStrain(0.0029, 500_000), uniaxialStrain(-0.002, 500_000)],
  },
  {
    // (ii) growing tension cycles under mixed control; most increments extend the envelope.
    name: "damaging",
    params: DEMO,
    legs: growingCycles(),
  },
  {
    // (iii) non-proportional: biaxial strain, then shear added with σ22 held, then stress-free
    // unloading and a reversed shear, all in the 30° damage frame.
    name: "biaxial",
    params: ROTATED,
    legs: [
      { control: ["strain", "strain", "stress"], target: [0.004, 0.003, 0], increments: 100_000 },
      { control: ["strain", "stress", "strain"], target: [0.005, 10, 0.006], increments: 100_000 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 100_000 },
      {
        control: ["strain", "strain", "strain"],
        target: [0.002, -0.001, -0.005],
        increments: 100_000,
      },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 100_000 },
    ],
  },
];

function median(values: number[]): number {
  const sorted = [...values].sort((x, y) => x - y);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Share of increments in which a damage grew (counted after timing; says what was measured). */
function damagingShare(d1: Float64Array, d2: Float64Array, rows: number): number {
  let grew = 0;
  for (let r = 1; r < rows; r++) if (d1[r] > d1[r - 1] || d2[r] > d2[r - 1]) grew++;
  return grew / (rows - 1);
}

interface TimedRun {
  /** increments per CPU second */
  rate: number;
  /** increments per wall-clock second */
  wallRate: number;
  bytesPerRow: number;
  damagingShare: number;
}

/** One timed run; returns increments per second and the bytes held per stored row. */
function timeRun(c: Case): TimedRun {
  const increments = c.legs.reduce((n, leg) => n + leg.increments, 0);
  const t0 = performance.now();
  const cpu0 = process.cpuUsage();
  const result = runPath(c.params, c.legs);
  const cpu = process.cpuUsage(cpu0);
  const seconds = (cpu.user + cpu.system) / 1e6;
  const wallSeconds = (performance.now() - t0) / 1000;
  if (result.status.failed || result.rows !== increments + 1) {
    // A benchmark that stops early measures the wrong thing: refuse to report it.
    throw new Error(
      `${c.name}: the path stopped early (${result.status.failMode ?? "rows missing"})`,
    );
  }
  const bytes = RESULT_COLUMNS.reduce((sum, name) => sum + result.columns[name].byteLength, 0);
  return {
    rate: increments / seconds,
    wallRate: increments / wallSeconds,
    bytesPerRow: bytes / result.rows,
    damagingShare: damagingShare(result.columns.d1, result.columns.d2, result.rows),
  };
}

function main(): void {
  const rates: Record<Case["name"], number> = { elastic: 0, damaging: 0, biaxial: 0 };
  let bytesPerIncrement = 0;
  for (const c of CASES) {
    timeRun(c); // warm-up: let the JIT compile the hot loops before timing
    const runs: number[] = [];
    const wallRuns: number[] = [];
    let share = 0;
    for (let i = 0; i < RUNS; i++) {
      const { rate, wallRate, bytesPerRow, damagingShare } = timeRun(c);
      runs.push(rate);
      wallRuns.push(wallRate);
      share = damagingShare;
      bytesPerIncrement = Math.max(bytesPerIncrement, bytesPerRow);
    }
    rates[c.name] = median(runs);
    const increments = c.legs.reduce((n, leg) => n + leg.increments, 0);
    const spread = (xs: number[]) =>
      xs.map((r) => Math.round(r).toLocaleString("en-US")).join(", ");
    console.log(
      `${c.name}: ${increments.toLocaleString("en-US")} increments per run, ` +
        `${(100 * share).toFixed(1)} % with damage growth; per CPU second ${spread(runs)}; ` +
        `per wall-clock second ${spread(wallRuns)}`,
    );
  }
  const n = (x: number) => Math.round(x);
  console.log(
    `bench: elastic=${n(rates.elastic)}/s damaging=${n(rates.damaging)}/s ` +
      `biaxial=${n(rates.biaxial)}/s bytesPerIncrement=${n(bytesPerIncrement)}`,
  );
}

try {
  main();
} catch (err) {
  console.error(`bench failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
}
