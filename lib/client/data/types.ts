// The API's response types, taken from the services that produce them (type-only imports: no
// server code reaches the browser bundle).
export type {
  ScenarioListResponse,
  CreateScenarioResponse,
} from "@/lib/server/workspace/scenarios";
export type { ScenarioSummary } from "@/db/queries/scenarios";
export type {
  RevisionListResponse,
  RevisionResponse,
  SaveRevisionResponse,
} from "@/lib/server/workspace/revisions";
export type { RevisionMeta } from "@/db/queries/revisions";
export type { RevisionDiffResponse } from "@/lib/server/workspace/diff-revisions";
export type { RevisionDiff, SetDiff, LegDiff, FieldChange } from "@/lib/shared/revision-diff";
export type { ReviewHistoryResponse, ReviewActionResponse } from "@/lib/server/workspace/review";
export type { CommentListResponse, CommentNode } from "@/lib/server/workspace/comments";
export type {
  ShareLinkListResponse,
  CreateShareLinkResponse,
} from "@/lib/server/workspace/share-links";
export type { ShareLinkView } from "@/db/queries/share-links";
export type { SharedRevisionResponse } from "@/lib/server/workspace/share-view";
export type {
  ParameterSetListResponse,
  ParameterSetResponse,
} from "@/lib/server/workspace/parameter-sets";
export type { ParameterSetVersionSummary } from "@/lib/server/workspace/parameter-set-versions";
export type { ParameterSetView } from "@/db/queries/parameter-sets";
export type { AuditLogResponse } from "@/lib/server/workspace/audit-log";
export type { PersonRef } from "@/db/queries/users-view";
export type { ReviewActionInput } from "@/lib/shared/validations/workspace";

export type ReviewState = "draft" | "in_review" | "approved" | "changes_requested";
export type ReviewAction = "request" | "approve" | "request-changes";
