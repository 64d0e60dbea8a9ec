import { describe, expect, it } from "vitest";

import { cssString } from "@/lib/shared/css-string";

describe("cssString", () => {
  it("keeps letters, digits and spaces as they are", () => {
    expect(cssString("Demo plate 2")).toBe('"Demo plate 2"');
  });

  it("escapes what could end the string or the style element", () => {
    const s = cssString('a"b</style><script>');
    expect(s).not.toMatch(/<|"b|\/style/);
    expect(s).toBe('"a\\22 b\\3c \\2f style\\3e \\3c script\\3e "');
  });

  it("escapes non-ASCII by code point (σ is U+03C3) and folds line breaks", () => {
    expect(cssString("σ11\nε")).toBe('"\\3c3 11 \\3b5 "');
  });
});
