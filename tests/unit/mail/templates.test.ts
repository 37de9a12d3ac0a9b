import { describe, expect, it } from "vitest";
import { inviteMail, passwordResetMail } from "@/lib/mail/templates";

describe("mail templates", () => {
  const expiresAt = new Date("2026-12-08T10:00:00Z");
  it("invite names the company, the inviter, the role, the link and the expiry", () => {
    const m = inviteMail({ to: "a@b.example", organisationName: "Acme Fill", inviterName: "Ann", role: "yard_hand", link: "http://x/invite/abc", expiresAt, timeZone: "America/Chicago" });
    expect(m.subject).toBe("Ann invited you to Acme Fill on Linkyard");
    expect(m.text).toContain("as yard hand");
    expect(m.text).toContain("http://x/invite/abc");
    expect(m.text).toContain("expires on 2026-12-08 04:00 (America/Chicago time)");
  });
  it("reset mail carries its link and says what happens if ignored", () => {
    const m = passwordResetMail({ to: "a@b.example", link: "http://x/reset-password/t", expiresAt, timeZone: "UTC" });
    expect(m.text).toContain("expires on 2026-12-08 10:00 (UTC time)");
    expect(m.text).toContain("http://x/reset-password/t");
    expect(m.text).toContain("your password stays as it is");
  });
});
