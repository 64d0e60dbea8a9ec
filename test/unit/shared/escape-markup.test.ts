import { describe, expect, it } from "vitest";

import { escapeMarkup } from "@/lib/shared/escape-markup";

describe("escapeMarkup", () => {
  it("turns the five markup characters into entities, ampersand first", () => {
    expect(escapeMarkup(`<b>"Plate" & 'rib'</b>`)).toBe(
      "&lt;b&gt;&#34;Plate&#34; &amp; &#39;rib&#39;&lt;/b&gt;",
    );
    expect(escapeMarkup("&lt;")).toBe("&amp;lt;");
  });

  it("leaves other text, symbols included, as typed", () => {
    expect(escapeMarkup("σ11 – ε11, 0.5 %")).toBe("σ11 – ε11, 0.5 %");
  });
});
