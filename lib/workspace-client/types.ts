// The API's response types, taken from the services that produce them (type-only imports: no
// server code reaches the browser bundle).
export type { ScenarioListResponse, CreateScenarioResponse } from "@/lib/workspace/scenarios";
export type { ScenarioSummary } from "@/db/queries/scenarios";
export type {
  RevisionListResponse,
  RevisionResponse,
  SaveRevisionResponse,
} from "@/lib/workspace/revisions";
export type { RevisionMeta } from "@/db/queries/revisions";
export type { RevisionDiffResponse } from "@/lib/workspace/diff-revisions";
export type { RevisionDiff, SetDiff, LegDiff, FieldChange } from "@/lib/workspace/revision-diff";
export type { ReviewHistoryResponse, ReviewActionResponse } from "@/lib/workspace/review";
export type { CommentListResponse, CommentNode } from "@/lib/workspace/comments";
export type { ShareLinkListResponse, CreateShareLinkResponse } from "@/lib/workspace/share-links";
export type { ShareLinkView } from "@/db/queries/share-links";
export type { SharedRevisionResponse } from "@/lib/workspace/share-view";
export type { ParameterSetListResponse } from "@/lib/workspace/parameter-sets";
export type { ParameterSetView } from "@/db/queries/parameter-sets";
export type { AuditLogResponse } from "@/lib/workspace/audit-log";
export type { PersonRef } from "@/db/queries/users-view";

export type ReviewState = "draft" | "in_review" | "approved" | "changes_requested";
export type ReviewAction = "request" | "approve" | "request-changes";
