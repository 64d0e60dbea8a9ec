import { existsSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { openApiDocument } from "@/lib/server/handoff/openapi/document";

const doc = openApiDocument();

/** "/teams/{team}/studies/{study}" → app/api/v1/teams/[team]/studies/[study]/route.ts */
function routeFile(apiPath: string): string {
  const segments = apiPath.replace(/\{(\w+)\}/g, (_, name: string) => `[${name}]`);
  return path.join(process.cwd(), "app/api/v1", segments, "route.ts");
}

function refs(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => refs(v, out));
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (k === "$ref" && typeof v === "string") out.push(v);
      else refs(v, out);
    }
  }
  return out;
}

describe("OpenAPI document", () => {
  it("is OpenAPI 3.1 with bearer and session security and the caution", () => {
    expect(doc.openapi).toBe("3.1.0");
    expect(doc.components.securitySchemes.bearer).toMatchObject({ type: "http", scheme: "bearer" });
    expect(doc.info.description).toContain("no design allowable");
  });

  it("describes only routes that exist, each with the method the route exports", async () => {
    for (const [apiPath, methods] of Object.entries(doc.paths)) {
      const file = routeFile(apiPath);
      expect(existsSync(file), file).toBe(true);
      const mod = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
      for (const method of Object.keys(methods))
        expect(typeof mod[method.toUpperCase()], `${method} ${apiPath}`).toBe("function");
    }
  });

  it("resolves every $ref to a component schema", () => {
    const names = new Set(
      Object.keys(doc.components.schemas).map((n) => `#/components/schemas/${n}`),
    );
    for (const ref of refs(doc)) expect(names.has(ref), ref).toBe(true);
  });

  it("takes the scenario file schema from the zod schema the routes validate with", () => {
    const file = doc.components.schemas.ScenarioFile as {
      required: string[];
      properties: Record<string, { const?: string }>;
    };
    expect(file.required).toEqual(expect.arrayContaining(["format", "parameterSets", "path"]));
    expect(file.properties.format.const).toBe("craquelure.scenario/1");
    const study = doc.components.schemas.StudyRequest as { properties: Record<string, unknown> };
    expect(Object.keys(study.properties)).toEqual(expect.arrayContaining(["scenario", "grid"]));
  });
});
