import { openApiDocument } from "@/lib/server/handoff/openapi/document";

/** Public: the document describes the API, it grants nothing. */
export function GET(): Response {
  return Response.json(openApiDocument(), { headers: { "cache-control": "public, max-age=300" } });
}
