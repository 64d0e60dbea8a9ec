import "server-only";

/** The operations of the public API (paths relative to /api/v1), as OpenAPI 3.1 objects. */
type Op = Record<string, unknown>;

const ref = (name: string) => ({ $ref: `#/components/schemas/${name}` });
const json = (schema: unknown) => ({ "application/json": { schema } });
const err = (description: string) => ({ description, content: json(ref("Error")) });

const COMMON = {
  "401": err("No valid session or token (unknown, revoked, or its owner left the team)"),
  "404": err("No such team, scenario or revision for this caller (also another team's ids)"),
  "429": err("Too many requests for this token; see Retry-After"),
};

const team = { name: "team", in: "path", required: true, schema: { type: "string" } };
const scenario = {
  name: "scenario",
  in: "path",
  required: true,
  schema: { type: "string", format: "uuid" },
};
const number = {
  name: "number",
  in: "path",
  required: true,
  schema: { type: "integer", minimum: 1 },
};
const study = {
  name: "study",
  in: "path",
  required: true,
  schema: { type: "string", format: "uuid" },
};
const revisionParams = [team, scenario, number];

const CSV = { "text/csv": { schema: { type: "string" } } };
const ZIP = { "application/zip": { schema: { type: "string", contentEncoding: "binary" } } };

export const OPERATIONS: Record<string, Record<string, Op>> = {
  "/runs": {
    post: {
      operationId: "runScenario",
      summary: "Run a scenario file with the same core as the command-line driver",
      description:
        "Answers exactly what `npm run --silent drive -- file.json [--set id] [--format csv|json]` prints. Send the bare scenario file (set and format as query parameters, or the Accept header), or a RunRequest. Any role. Caps: at most 12 parameter sets per scenario file and 1,000,001 rows (1,000,000 increments) per run.",
      parameters: [
        { name: "set", in: "query", schema: { type: "string" } },
        { name: "format", in: "query", schema: { type: "string", enum: ["csv", "json"] } },
      ],
      requestBody: {
        required: true,
        content: json({ oneOf: [ref("ScenarioFile"), ref("RunRequest")] }),
      },
      responses: {
        "200": {
          description: "The run's columns (CSV or JSON as in the command-line contract)",
          content: { ...CSV, ...json({ type: "object" }) },
        },
        "400": err(
          "The body is not JSON, or a cap is passed (invalid:cap): more than 12 parameter sets per scenario file, or more than 1,000,001 rows per run",
        ),
        "413": err("More than 1,000,000 increments, or a body over 4 MB"),
        "422": err(
          "The file does not validate (message names the field), or the run exceeded its time budget",
        ),
        ...COMMON,
      },
    },
  },
  "/orientation": {
    post: {
      operationId: "computeOrientationState",
      summary:
        "In-plane stiffness and damage frame of a moulded layer stack from its orientation tensors",
      description:
        "For each layer (thickness fraction, planar orientation tensor a11, a12 with a22 = 1 − a11) and the stack: principal direction thetaA, order parameter s, E1, E2, nu12, G12 and the damage frame thetaD, from the aligned ply (typed in or by Halpin–Tsai from constituents) averaged through the Tsai–Pagano invariants with the chosen closure. With cutAngle φ, couponThetaD = thetaA − φ. Any role. Starting values only: the orientation state comes from a mould-filling simulation or a scan, and the result is no design allowable.",
      requestBody: { required: true, content: json(ref("OrientationRequest")) },
      responses: {
        "200": {
          description:
            "closure, ply, layers (per layer: fraction, a11, a12, thetaA, s, E1, E2, nu12, G12, thetaD), stack (E1, E2, nu12, G12, thetaD), stiffness (A/h in x–y axes, MPa), couponThetaD, caution",
          content: json({ type: "object" }),
        },
        "400": err("The body is not JSON, or a field is out of range (the message names it)"),
        "413": err("A body over 64 KB"),
        ...COMMON,
      },
    },
  },
  "/teams/{team}/scenarios": {
    get: {
      operationId: "listScenarios",
      summary: "List the team's scenarios (team:read)",
      parameters: [
        team,
        ...["sort", "dir", "tag", "review", "author", "q", "page", "pageSize"].map((name) => ({
          name,
          in: "query",
          schema: { type: "string" },
        })),
      ],
      responses: {
        "200": { description: "A page of scenarios", content: json({ type: "object" }) },
        ...COMMON,
      },
    },
  },
  "/teams/{team}/scenarios/{scenario}/revisions": {
    get: {
      operationId: "listRevisions",
      summary: "List a scenario's revisions, newest first (team:read)",
      parameters: [team, scenario],
      responses: {
        "200": {
          description: "Revisions with author, message, review state",
          content: json({ type: "object" }),
        },
        ...COMMON,
      },
    },
  },
  "/teams/{team}/scenarios/{scenario}/revisions/{number}": {
    get: {
      operationId: "getRevision",
      summary: "Fetch one revision with its scenario file (team:read)",
      parameters: revisionParams,
      responses: {
        "200": {
          description: "Revision metadata and `file` (a ScenarioFile)",
          content: json({ type: "object" }),
        },
        ...COMMON,
      },
    },
  },
  "/teams/{team}/scenarios/{scenario}/revisions/{number}/bundle": {
    get: {
      operationId: "getReferenceBundle",
      summary: "Reference bundle of a revision: scenario file, reference curves, note (export)",
      parameters: revisionParams,
      responses: { "200": { description: "A zip file", content: ZIP }, ...COMMON },
    },
  },
  "/teams/{team}/scenarios/{scenario}/revisions/{number}/conformance": {
    get: {
      operationId: "listConformanceChecks",
      summary: "Conformance checks recorded on a revision (team:read)",
      parameters: revisionParams,
      responses: {
        "200": { description: "Checks, newest first", content: json({ type: "object" }) },
        ...COMMON,
      },
    },
    post: {
      operationId: "runConformanceCheck",
      summary: "Compare an uploaded single-point history with Craquelure's answer (scenario:edit)",
      parameters: revisionParams,
      requestBody: { required: true, content: json(ref("ConformanceUpload")) },
      responses: {
        "201": {
          description: "The recorded check with pass/fail per quantity",
          content: json({ type: "object" }),
        },
        "422": err("The CSV cannot be read (message names line and cell) or lacks a column"),
        ...COMMON,
      },
    },
  },
  "/teams/{team}/studies": {
    post: {
      operationId: "submitParameterStudy",
      summary: "Submit a parameter study to the queue (fit:run)",
      parameters: [team],
      requestBody: { required: true, content: json(ref("StudyRequest")) },
      responses: {
        "201": {
          description: "The study's id and number of sets",
          content: json({ type: "object" }),
        },
        "413": err("Too many sets or increments"),
        "422": err("A set or the path does not validate"),
        ...COMMON,
      },
    },
  },
  "/teams/{team}/studies/{study}": {
    get: {
      operationId: "getParameterStudy",
      summary: "Progress and per-set state of a study (team:read)",
      parameters: [team, study],
      responses: {
        "200": { description: "Counts and items", content: json({ type: "object" }) },
        ...COMMON,
      },
    },
  },
  "/teams/{team}/studies/{study}/results": {
    get: {
      operationId: "getParameterStudyResults",
      summary: "Results of a study: one CSV per set and a summary, zipped (export)",
      parameters: [team, study],
      responses: { "200": { description: "A zip file", content: ZIP }, ...COMMON },
    },
  },
};
