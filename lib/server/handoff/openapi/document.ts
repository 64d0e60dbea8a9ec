import "server-only";

import { componentSchemas } from "./components";
import { OPERATIONS } from "./operations";

export const API_CAUTION =
  "Results come from a phenomenological model fitted to coupon tests; they are no design allowable. Structural decisions rest with qualified engineers under the applicable codes, standards and qualification procedures.";

/** The OpenAPI 3.1 document of the public API, built from the routes' zod schemas. */
export function openApiDocument(serverUrl = "/api/v1") {
  return {
    openapi: "3.1.0",
    info: {
      title: "Craquelure API",
      version: "1",
      description: `Run scenarios, read the team's scenarios and revisions, check conformance, fetch reference bundles and run parameter studies. Authenticate with a personal API token from your account page: \`Authorization: Bearer crq_…\`. A token works in its one team, with a role no higher than yours. ${API_CAUTION}`,
    },
    servers: [{ url: serverUrl }],
    security: [{ bearer: [] }, { session: [] }],
    paths: OPERATIONS,
    components: {
      schemas: componentSchemas(),
      securitySchemes: {
        bearer: { type: "http", scheme: "bearer", description: "Personal API token (crq_…)" },
        session: { type: "apiKey", in: "cookie", name: "craq_session" },
      },
    },
  };
}
