// Where each workspace route lives, built in one place so pages and hooks agree.

const enc = encodeURIComponent;

export function teamApi(slug: string) {
  const base = `/api/v1/teams/${enc(slug)}`;
  const scenario = (id: string) => `${base}/scenarios/${enc(id)}`;
  const revision = (id: string, n: number) => `${scenario(id)}/revisions/${n}`;
  return {
    scenarios: (query = "") => `${base}/scenarios${query ? `?${query}` : ""}`,
    scenario,
    revisions: (id: string) => `${scenario(id)}/revisions`,
    revision,
    diff: (id: string, from: number, to: number) => `${scenario(id)}/diff?from=${from}&to=${to}`,
    review: (id: string, n: number) => `${revision(id, n)}/review`,
    comments: (id: string, n: number) => `${revision(id, n)}/comments`,
    createShareLink: (id: string, n: number) => `${revision(id, n)}/share-links`,
    shareLinks: (scenarioId: string) => `${base}/share-links?scenario=${enc(scenarioId)}`,
    shareLink: (linkId: string) => `${base}/share-links/${enc(linkId)}`,
    parameterSets: () => `${base}/parameter-sets`,
    parameterSet: (id: string) => `${base}/parameter-sets/${enc(id)}`,
    audit: (page: number) => `${base}/audit?page=${page}`,
    testRecords: () => `${base}/test-records`,
    testRecord: (id: string) => `${base}/test-records/${enc(id)}`,
    importTeam: () => `${base}/import`,
  };
}

/** App pages (not API). */
export function teamPages(slug: string) {
  const base = `/teams/${enc(slug)}`;
  return {
    scenarios: `${base}/scenarios`,
    newScenario: `${base}/scenarios/new`,
    importSection: `${base}/settings#import`,
    scenario: (id: string, params: Record<string, string | number | undefined> = {}) => {
      const q = Object.entries(params)
        .filter(([, v]) => v !== undefined && v !== "")
        .map(([k, v]) => `${k}=${enc(String(v))}`)
        .join("&");
      return `${base}/scenarios/${enc(id)}${q ? `?${q}` : ""}`;
    },
  };
}
