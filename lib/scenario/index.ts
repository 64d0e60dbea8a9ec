/** Public surface of the scenario file module (see README.md in this folder). */
export { PARAMETER_FIELDS, type ParameterField } from "./parameter-fields";
export {
  parameterSetSchema,
  toMaterialParams,
  type ParameterSet,
  type ParameterSetInput,
} from "./parameter-set-schema";
export { legSchema, pathSchema, MAX_TOTAL_INCREMENTS, type Path } from "./path-schema";
export {
  cycleGeneratorSchema,
  expandCycles,
  expandGenerators,
  type CycleGenerator,
  type PathItem,
  type PlacedGenerator,
} from "./cycle-generator";
export {
  scenarioFileSchema,
  parseScenarioFile,
  defaultSetId,
  SCENARIO_FORMAT,
  type Scenario,
  type ParseResult,
} from "./scenario-schema";
export { resultsToCsv, resultsCsvChunks, CSV_HEADER } from "./results-csv";
export { resultsToJson, resultsJsonChunks } from "./results-json";
