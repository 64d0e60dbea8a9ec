import { isReviewState } from "./review-words";
import type { ReviewState } from "./types";

/** The scenarios table's state as it lives in the page address (and goes to the list route). */
export interface ScenarioListState {
  sort: "name" | "updated" | "review";
  dir: "asc" | "desc";
  tag: string;
  review: ReviewState | "";
  author: string;
  page: number;
}

export const PAGE_SIZE = 20;

const SORTS = ["name", "updated", "review"] as const;

function defaultDir(sort: ScenarioListState["sort"]): "asc" | "desc" {
  return sort === "updated" ? "desc" : "asc";
}

type Params = URLSearchParams | Record<string, string | string[] | undefined>;

function read(params: Params, key: string): string {
  const raw = params instanceof URLSearchParams ? params.get(key) : params[key];
  const value = Array.isArray(raw) ? raw[0] : raw;
  return (value ?? "").trim();
}

/** Unknown or malformed values fall back to defaults: a hand-edited address never errors. */
export function parseListState(params: Params): ScenarioListState {
  const sortRaw = read(params, "sort");
  const sort = (SORTS as readonly string[]).includes(sortRaw)
    ? (sortRaw as ScenarioListState["sort"])
    : "updated";
  const dirRaw = read(params, "dir");
  const dir = dirRaw === "asc" || dirRaw === "desc" ? dirRaw : defaultDir(sort);
  const review = read(params, "review");
  const author = read(params, "author");
  const page = Number(read(params, "page"));
  return {
    sort,
    dir,
    tag: read(params, "tag").slice(0, 40),
    review: isReviewState(review) ? review : "",
    author: /^[0-9a-f-]{36}$/i.test(author) ? author : "",
    page: Number.isInteger(page) && page >= 1 && page <= 1_000_000 ? page : 1,
  };
}

/** The query string for both the page address and the list route (defaults left out). */
export function listQueryString(state: ScenarioListState, pageSize = PAGE_SIZE): string {
  const q = new URLSearchParams();
  if (state.sort !== "updated") q.set("sort", state.sort);
  if (state.dir !== defaultDir(state.sort)) q.set("dir", state.dir);
  if (state.tag) q.set("tag", state.tag);
  if (state.review) q.set("review", state.review);
  if (state.author) q.set("author", state.author);
  if (state.page > 1) q.set("page", String(state.page));
  q.set("pageSize", String(pageSize));
  return q.toString();
}

/** Clicking a column: same column flips direction, another column starts at its default. */
export function toggleSort(
  state: ScenarioListState,
  sort: ScenarioListState["sort"],
): ScenarioListState {
  const dir = state.sort === sort ? (state.dir === "asc" ? "desc" : "asc") : defaultDir(sort);
  return { ...state, sort, dir, page: 1 };
}

export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
