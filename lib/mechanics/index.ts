/** Public surface of the numerical core (see README.md for the module map). */
export { PathRun, runPath, MAX_LEVEL, type PathResult } from "./driver";
export { localStepFrom, controlMask, type SingleStepResult } from "./single-step";
export { LocalStepper, DELTA_D_MAX } from "./local-step";
export { TangentKernel, type StepFlags } from "./tangent";
export { ElasticSolver } from "./elastic-solve";
export { compileMaterial, type Material } from "./material";
export { BYTES_PER_ROW, sliceColumns } from "./result-columns";
export * as StateLayout from "./state";
export {
  checkParams,
  checkLegs,
  isIsotropic,
  MechanicsInputError,
  MAX_TOTAL_INCREMENTS,
} from "./validate";
export * from "./types";
