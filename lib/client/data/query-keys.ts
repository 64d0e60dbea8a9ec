// TanStack Query keys of the workspace; invalidating a prefix refreshes everything under it.
export const workspaceKeys = {
  team: (slug: string) => ["team", slug] as const,
  scenarioList: (slug: string, query: string) =>
    ["team", slug, "scenarios", "list", query] as const,
  scenario: (slug: string, id: string) => ["team", slug, "scenarios", id] as const,
  revisions: (slug: string, id: string) => ["team", slug, "scenarios", id, "revisions"] as const,
  review: (slug: string, id: string, n: number) =>
    ["team", slug, "scenarios", id, "review", n] as const,
  comments: (slug: string, id: string, n: number) =>
    ["team", slug, "scenarios", id, "comments", n] as const,
  diff: (slug: string, id: string, from: number, to: number) =>
    ["team", slug, "scenarios", id, "diff", from, to] as const,
  shareLinks: (slug: string, id: string) => ["team", slug, "scenarios", id, "share-links"] as const,
  parameterSets: (slug: string) => ["team", slug, "parameter-sets"] as const,
  testRecords: (slug: string) => ["team", slug, "test-records"] as const,
  testRecord: (slug: string, id: string) => ["team", slug, "test-records", id] as const,
  audit: (slug: string, page: number) => ["team", slug, "audit", page] as const,
};
