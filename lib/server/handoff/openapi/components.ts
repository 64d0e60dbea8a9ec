import "server-only";

/**
 * Component schemas of the public API, generated from the same zod schemas the routes validate
 * with (z.toJSONSchema), so the document cannot describe a body the server would refuse.
 */
import { z } from "zod";

import { createApiTokenSchema } from "@/lib/server/accounts/api-tokens/schema";
import { conformanceUploadSchema } from "@/lib/server/handoff/conformance/upload-schema";
import { orientationRequestSchema } from "@/lib/calibration/micromechanics/orientation-request";
import { runRequestSchema } from "@/lib/server/handoff/runs/run-request";
import { scenarioFileSchema } from "@/lib/scenario/scenario-schema";
import { studyRequestSchema } from "@/lib/server/handoff/studies/schema";

type JsonSchema = Record<string, unknown>;

function fromZod(schema: z.ZodType): JsonSchema {
  const { $schema: _drop, ...rest } = z.toJSONSchema(schema, {
    io: "input",
    unrepresentable: "any",
    target: "draft-2020-12",
  }) as JsonSchema;
  return rest;
}

const errorSchema = z.object({
  error: z.object({
    code: z.string().describe('Stable code, e.g. "invalid:file", "not-found:revision"'),
    message: z.string().describe("Written for people"),
    path: z.string().optional().describe("JSON path of the offending field, when one is known"),
  }),
});

export function componentSchemas(): Record<string, JsonSchema> {
  return {
    ScenarioFile: fromZod(scenarioFileSchema),
    RunRequest: {
      ...fromZod(runRequestSchema),
      properties: {
        ...(fromZod(runRequestSchema).properties as JsonSchema),
        scenario: { $ref: "#/components/schemas/ScenarioFile" },
      },
    },
    StudyRequest: fromZod(studyRequestSchema),
    OrientationRequest: fromZod(orientationRequestSchema),
    ConformanceUpload: fromZod(conformanceUploadSchema),
    ApiTokenRequest: fromZod(createApiTokenSchema),
    Error: fromZod(errorSchema),
  };
}
