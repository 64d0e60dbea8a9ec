import { describe, expect, it } from "vitest";

import { imageStamp, STAMP_TOP, stampedLayout } from "@/lib/client/loading-desk/image-stamp";

const date = new Date("2026-12-04T09:30:00Z");

/** The stamp of an unsaved "Damage" chart with no sets drawn. */
function unsavedStamp(scenarioName: string) {
  return imageStamp({ chartTitle: "Damage", scenarioName, revision: null, sets: [], date });
}

describe("the stamp on a saved chart image (issue 15)", () => {
  it("names the chart, scenario, revision, sets drawn, date and the caution", () => {
    const stamp = imageStamp({
      chartTitle: "Stress–strain: σ11 against ε11",
      scenarioName: "Bracket rib",
      revision: "revision 3",
      sets: [
        { id: "A", label: "demo SMC" },
        { id: "B", label: "" },
      ],
      date,
    });
    expect(stamp.title).toBe("Stress–strain: σ11 against ε11 · Bracket rib (revision 3)");
    expect(stamp.footer).toBe(
      "Sets: A demo SMC, B · 2026-12-04 09:30 UTC · Craquelure · no design allowable",
    );
  });

  it("says when the work is not saved", () => {
    const stamp = unsavedStamp("x");
    expect(stamp.title).toBe("Damage · x (not saved)");
    expect(stamp.footer.startsWith("Sets: none")).toBe(true);
  });

  it("makes room above the plot and keeps the drawn layout, with typed names as plain text", () => {
    const stamp = unsavedStamp("<b>rib</b> & co");
    const drawn = { margin: { l: 56, r: 12, t: 8, b: 40 }, showlegend: true };
    const out = stampedLayout(drawn, stamp) as {
      margin: Record<string, number>;
      title: { text: string };
      showlegend: boolean;
    };
    expect(out.margin).toEqual({ l: 56, r: 12, t: 8 + STAMP_TOP, b: 40 });
    expect(out.showlegend).toBe(true);
    expect(out.title.text).toContain("&lt;b&gt;rib&lt;/b&gt; &amp; co");
    expect(out.title.text).toContain('<br><span style="font-size:10px">Sets: none');
    expect(drawn.margin.t).toBe(8);
  });
});
