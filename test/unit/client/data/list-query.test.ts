import { describe, expect, it } from "vitest";

import {
  listQueryString,
  pageCount,
  parseListState,
  toggleSort,
} from "@/lib/client/data/list-query";
import { parseTags } from "@/lib/client/data/tags";

describe("scenario list state in the address", () => {
  it("falls back to newest first on page 1 for an empty or hand-mangled address", () => {
    const s = parseListState(new URLSearchParams("sort=size&dir=up&page=-3&review=maybe&author=x"));
    expect(s).toEqual({ sort: "updated", dir: "desc", tag: "", review: "", author: "", page: 1 });
  });

  it("keeps valid filters and writes only what differs from the defaults", () => {
    const author = "0b8c7f1e-1111-4222-8333-444455556666";
    const s = parseListState({
      sort: "name",
      tag: " crash ",
      review: "in_review",
      author,
      page: "3",
    });
    expect(s).toMatchObject({
      sort: "name",
      dir: "asc",
      tag: "crash",
      review: "in_review",
      page: 3,
    });
    expect(listQueryString(s, 10)).toBe(
      `sort=name&tag=crash&review=in_review&author=${author}&page=3&pageSize=10`,
    );
    expect(listQueryString(parseListState({}), 20)).toBe("pageSize=20");
  });

  it("flips the direction on the same column and resets the page on another", () => {
    const s = parseListState({ sort: "name", page: "4" });
    expect(toggleSort(s, "name")).toMatchObject({ sort: "name", dir: "desc", page: 1 });
    expect(toggleSort(s, "updated")).toMatchObject({ sort: "updated", dir: "desc", page: 1 });
  });

  it("counts pages, at least one", () => {
    expect(pageCount(0, 20)).toBe(1);
    expect(pageCount(41, 20)).toBe(3);
  });
});

describe("tags typed as text", () => {
  it("splits on commas, trims and drops empties and repeats", () => {
    expect(parseTags(" crash, 23 °C ,,crash ")).toEqual(["crash", "23 °C"]);
    expect(parseTags("")).toEqual([]);
  });
});
