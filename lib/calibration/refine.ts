/**
 * Refinement (issue 6): least squares over all chosen records, each measured strain history
 * replayed through the driver, by Levenberg–Marquardt (ml-levenberg-marquardt) with bounds and
 * fixed/free parameters. Pure and deterministic; `onProgress` and `shouldCancel` let a worker host
 * it. Residuals are divided by each record's peak |stress| so records of different size weigh
 * alike.
 */
import { levenbergMarquardt } from "ml-levenberg-marquardt";
import type { MaterialParams } from "@/lib/mechanics/types";
import { cleanRecord } from "./clean";
import { decimationIndices } from "./decimate";
import { inseparableParams, type Inseparable } from "./identifiability";
import { assertRefineBounds } from "./refine-bounds-check";
import { applyIsotropicTies, planRefinement, refineNotes } from "./refine-plan";
import { paramVector, type Bounds, type FittableParam } from "./refine-params";
import { canReplay, replayRecord } from "./replay";
import type { RecordPoints, TestRecordInput } from "./types";
import { fitUncertainty, type FitUncertainty } from "./uncertainty";

export interface RefineProgress {
  round: number;
  evaluations: number;
  rms: number; // scaled (relative to each record's peak stress), over the fitted samples
  /** the best parameters so far: what a cancel keeps (the host may stop the worker outright) */
  best: MaterialParams;
}

export interface RefineOptions {
  free: FittableParam[];
  bounds?: Bounds;
  onProgress?: (p: RefineProgress) => void;
  shouldCancel?: () => boolean;
  maxRounds?: number; // rounds of 3 Levenberg–Marquardt iterations
  maxPointsPerRecord?: number; // samples replayed inside the loop
  /** In-plane isotropy kept through the fit; default: the start set is isotropic (refine-plan). */
  isotropic?: boolean;
}

export interface RecordResidual {
  id: string;
  rms: number; // MPa, full record
  points: number;
}

export interface RefineResult {
  params: MaterialParams;
  residuals: RecordResidual[];
  skipped: string[]; // records whose test type cannot be replayed
  inseparable: Inseparable[];
  rounds: number;
  evaluations: number;
  cancelled: boolean;
  isotropic: boolean; // axis 2 and G12 followed axis 1 throughout
  free: FittableParam[]; // what the least squares moved
  tied: FittableParam[]; // recomputed from axis 1 (isotropic sets)
  notInformed: FittableParam[]; // asked free, but these records cannot inform them: kept
  notes: string[]; // records used (by name), ties, values kept
  /** standard errors, 95 % intervals, correlations of `free`; null when cancelled or none free */
  uncertainty: FitUncertainty | null;
}

class Cancelled extends Error {}

interface Prepared {
  record: TestRecordInput;
  points: RecordPoints; // decimated
  offset: number; // first index in the stacked residual vector
  scale: number; // MPa
}

function prepare(records: TestRecordInput[], maxPoints: number): { sets: Prepared[]; y: number[] } {
  const sets: Prepared[] = [];
  const y: number[] = [];
  for (const record of records) {
    const clean = cleanRecord(record.points);
    const keep = decimationIndices(clean.strain, maxPoints);
    const pick = (a: Float64Array) => Float64Array.from(keep, (i) => a[i]);
    const points: RecordPoints = {
      strain: pick(clean.strain),
      stress: pick(clean.stress),
      transverseStrain: clean.transverseStrain && pick(clean.transverseStrain),
    };
    const scale = Math.max(1e-9, ...Array.from(points.stress, Math.abs));
    sets.push({ record, points, offset: y.length, scale });
    for (const s of points.stress) y.push(s / scale);
  }
  return { sets, y };
}

type ProblemOptions = Pick<
  RefineOptions,
  "free" | "bounds" | "isotropic" | "maxPointsPerRecord" | "shouldCancel"
>;

/**
 * The least-squares problem of a refinement: the replayable records, the plan (free, tied, not
 * informed), the stacked scaled data y, the scaled parameter vector and the model u → prediction.
 */
function leastSquaresProblem(
  records: TestRecordInput[],
  start: MaterialParams,
  options: ProblemOptions,
) {
  const usable = records.filter((r) => canReplay(r.testType));
  const left = records.filter((r) => !canReplay(r.testType));
  const skipped = left.map((r) => r.id);
  const plan = planRefinement(usable, start, options.free, options.isotropic);
  const tie = plan.isotropic ? applyIsotropicTies : (p: MaterialParams) => p;
  const { sets, y } = prepare(usable, options.maxPointsPerRecord ?? 500);
  const base = tie(start);
  const plain = paramVector(base, plan.free, options.bounds);
  const vector = { ...plain, toParams: (u: ArrayLike<number>) => tie(plain.toParams(u)) };
  let evaluations = 0;

  // One replay of every record per parameter vector; the library then asks point by point.
  const model = (u: ArrayLike<number>): Float64Array => {
    if (options.shouldCancel?.()) throw new Cancelled();
    evaluations++;
    const out = new Float64Array(y.length);
    let params: MaterialParams;
    try {
      params = vector.toParams(u);
      for (const set of sets) {
        const { predicted } = replayRecord(params, set.record.testType, set.points);
        for (let i = 0; i < predicted.length; i++) out[set.offset + i] = predicted[i] / set.scale;
      }
    } catch (error) {
      if (error instanceof Cancelled) throw error;
      // Inadmissible trial (e.g. a·sqrt(Y0) ≥ 1): a zero prediction is a large residual, so the
      // damping grows and the step is refused.
      out.fill(0);
    }
    return out;
  };
  return { usable, left, skipped, plan, y, vector, model, evaluations: () => evaluations };
}

/** Standard errors, intervals and correlations at u from the model's Jacobian J there. */
function uncertaintyFrom(
  problem: ReturnType<typeof leastSquaresProblem>,
  J: number[][],
  u: number[],
): FitUncertainty | null {
  const { model, y, vector } = problem;
  const m = model(u);
  const r = Float64Array.from(y, (yi, i) => m[i] - yi);
  const params = vector.toParams(u);
  const values = vector.names.map((n) => params[n]);
  return fitUncertainty(J, r, vector.names, vector.scale, values);
}

/**
 * The uncertainty of given values (a saved fit's) on the records: p + 2 replays, no search. The
 * server uses it so that what is stored comes from the stored records, not the browser's claim.
 */
export function uncertaintyAt(
  records: TestRecordInput[],
  params: MaterialParams,
  options: Omit<ProblemOptions, "shouldCancel">,
): FitUncertainty | null {
  const problem = leastSquaresProblem(records, params, options);
  const u = problem.vector.start.slice();
  if (u.length === 0) return null;
  return uncertaintyFrom(problem, jacobian(problem.model, u, problem.y.length), u);
}

export function refine(
  records: TestRecordInput[],
  start: MaterialParams,
  options: RefineOptions,
): RefineResult {
  assertRefineBounds(start, options.free, options.bounds); // before any replay
  const problem = leastSquaresProblem(records, start, options);
  const { usable, left, skipped, plan, y, vector, model } = problem;
  const data = { x: Float64Array.from(y, (_, i) => i), y };
  const rmsOf = (u: ArrayLike<number>) => {
    const m = model(u);
    let s = 0;
    for (let i = 0; i < y.length; i++) s += (m[i] - y[i]) ** 2;
    return Math.sqrt(s / y.length);
  };

  let u = vector.start.slice();
  let rms = rmsOf(u);
  let rounds = 0;
  let cancelled = false;
  try {
    const maxRounds = plan.free.length === 0 ? 0 : (options.maxRounds ?? 12);
    while (rounds < maxRounds) {
      rounds++;
      const fit = levenbergMarquardt(
        data,
        (p) => {
          const m = model(p);
          return (x) => m[x];
        },
        {
          initialValues: u,
          minValues: vector.min,
          maxValues: vector.max,
          gradientDifference: 1e-5,
          maxIterations: 3,
          errorTolerance: 1e-14 * y.length,
          improvementThreshold: 1e-3,
        },
      );
      const next = fit.parameterValues;
      const nextRms = rmsOf(next);
      const improved = nextRms < rms;
      if (improved) u = next;
      options.onProgress?.({
        round: rounds,
        evaluations: problem.evaluations(),
        rms: Math.min(rms, nextRms),
        best: vector.toParams(u),
      });
      const gain = (rms - nextRms) / Math.max(rms, 1e-300);
      if (improved) rms = nextRms;
      if (!improved || gain < 1e-6) break;
    }
  } catch (error) {
    if (!(error instanceof Cancelled)) throw error;
    cancelled = true;
  }
  const params = vector.toParams(u);
  // At the optimum (not after a cancel): one Jacobian serves separability and uncertainty.
  const J = cancelled || u.length === 0 ? null : jacobian(model, u, y.length);
  const uncertainty = J ? uncertaintyFrom(problem, J, u) : null;
  return {
    params,
    residuals: usable.map((record) => fullResidual(params, record)),
    skipped,
    inseparable: J ? inseparableParams(J, vector.names) : [],
    uncertainty,
    rounds,
    evaluations: problem.evaluations(),
    cancelled,
    ...plan,
    notes: refineNotes(usable, left, plan),
  };
}

/** Forward-difference Jacobian of the scaled model at u (rows: samples). */
function jacobian(
  model: (u: ArrayLike<number>) => Float64Array,
  u: number[],
  rows: number,
): number[][] {
  const base = model(u);
  const h = 1e-5;
  const J: number[][] = Array.from({ length: rows }, () => new Array(u.length).fill(0));
  u.forEach((_, j) => {
    const moved = u.slice();
    moved[j] += h;
    const m = model(moved);
    for (let i = 0; i < rows; i++) J[i][j] = (m[i] - base[i]) / h;
  });
  return J;
}

function fullResidual(params: MaterialParams, record: TestRecordInput): RecordResidual {
  const clean = cleanRecord(record.points);
  const { predicted } = replayRecord(params, record.testType, clean);
  let s = 0;
  for (let i = 0; i < predicted.length; i++) s += (predicted[i] - clean.stress[i]) ** 2;
  return {
    id: record.id,
    rms: Math.sqrt(s / Math.max(1, predicted.length)),
    points: predicted.length,
  };
}

/**
 * What a refinement stopped from outside (its worker ended) leaves: the best values of the last
 * round reported, with the plan and notes of a full run but no residuals or uncertainty, which
 * would need more replays. Nothing at all when no round had finished.
 */
export function keptOnCancel(
  records: TestRecordInput[],
  start: MaterialParams,
  options: Pick<RefineOptions, "free" | "isotropic">,
  last: RefineProgress | null,
): RefineResult | null {
  if (!last) return null;
  const usable = records.filter((r) => canReplay(r.testType));
  const left = records.filter((r) => !canReplay(r.testType));
  const plan = planRefinement(usable, start, options.free, options.isotropic);
  return {
    params: last.best,
    residuals: [],
    skipped: left.map((r) => r.id),
    inseparable: [],
    rounds: last.round,
    evaluations: last.evaluations,
    cancelled: true,
    ...plan,
    notes: [
      `Cancelled after round ${last.round}: these are the best values found so far (relative RMS ${last.rms.toExponential(2)}); residuals and intervals were not computed.`,
      ...refineNotes(usable, left, plan),
    ],
    uncertainty: null,
  };
}
