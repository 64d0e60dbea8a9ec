import { describe, expect, it } from "vitest";

import { invitationMessage } from "@/lib/server/email/templates/invitation";
import { resetPasswordMessage } from "@/lib/server/email/templates/reset";
import { verifyEmailMessage } from "@/lib/server/email/templates/verify";

const url = "http://127.0.0.1:3000/verify/abc";

describe("e-mail templates", () => {
  it("put the link in both the text and the HTML part", () => {
    for (const m of [
      verifyEmailMessage({ to: "a@x.test", name: "A", url }),
      resetPasswordMessage({ to: "a@x.test", name: "A", url }),
      invitationMessage({
        to: "a@x.test",
        inviterName: "B",
        teamName: "T",
        roleLabel: "Editor",
        url,
      }),
    ]) {
      expect(m.to).toBe("a@x.test");
      expect(m.text).toContain(url);
      expect(m.html).toContain(`href="${url}"`);
    }
  });

  it("escape user-chosen names in the HTML part", () => {
    const m = invitationMessage({
      to: "a@x.test",
      inviterName: "<script>alert(1)</script>",
      teamName: 'Lab "A" & <b>',
      roleLabel: "Viewer",
      url,
    });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;");
    expect(m.html).toContain("&#34;A&#34; &amp; &lt;b&gt;");
  });

  it("state the invited role and team in the invitation", () => {
    const m = invitationMessage({
      to: "a@x.test",
      inviterName: "Olga",
      teamName: "Crash lab",
      roleLabel: "Reviewer",
      url,
    });
    expect(m.subject).toBe("Olga invited you to Crash lab on Craquelure");
    expect(m.text).toContain("as reviewer");
  });
});
