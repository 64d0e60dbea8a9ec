import { tokenRoute } from "@/lib/server/http/route";
import { getStudy } from "@/lib/server/handoff/studies/service";

type Params = { team: string; study: string };

/** team:read → progress: total, done, failed, state, and each set's state and failure reason. */
export const GET = tokenRoute<Params>("team:read", ({ db, actor, params }) =>
  getStudy(db, actor, params.team, params.study),
);
