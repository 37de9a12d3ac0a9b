import { describe, expect, it } from "vitest";
import {
  accountExistsInviteMail,
  accountExistsSignUpMail,
  damageReportMail,
  inviteMail,
  kitCheckMail,
  kitLostItemMail,
  passwordResetMail,
  signUpConfirmMail,
  withUnsubscribe,
} from "@/lib/mail/templates";

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

  it("sign-up link names the company, the link and the expiry, and says nothing is made without it", () => {
    const m = signUpConfirmMail({ to: "a@b.example", organisationName: "Acme Fill", link: "http://x/sign-up/confirm/t", expiresAt, timeZone: "UTC" });
    expect(m.subject).toBe("Confirm your e-mail to set up Acme Fill on Linkyard");
    expect(m.text).toContain("http://x/sign-up/confirm/t");
    expect(m.text).toContain("expires on 2026-12-08 10:00 (UTC time)");
    expect(m.text).toContain("nothing is set up until the link is used");
  });
  it("tells a person with an account that a sign-up or an invite reached their address, with no link to use", () => {
    const signUp = accountExistsSignUpMail({ to: "a@b.example", attemptedName: "New Outfit", organisationName: "Acme Fill", appUrl: "http://x" });
    expect(signUp.text).toContain("tried to set up a new company, New Outfit");
    expect(signUp.text).toContain("already has a Linkyard account, with Acme Fill, so no new company was made");
    expect(signUp.text).toContain("http://x/forgot-password");
    expect(signUp.text).not.toMatch(/confirm\//);
    const other = accountExistsInviteMail({ to: "a@b.example", organisationName: "Bolt Paving", inviterName: "Ann", role: "planner", ownOrganisationName: "Acme Fill", appUrl: "http://x" });
    expect(other.subject).toBe("Ann invited you to Bolt Paving on Linkyard"); // the same words as an invite
    expect(other.text).toContain("already has a Linkyard account, with Acme Fill");
    expect(other.text).toContain("ask Ann to invite another of your e-mail addresses");
    expect(other.text).not.toContain("/invite/");
    const same = accountExistsInviteMail({ to: "a@b.example", organisationName: "Acme Fill", inviterName: "Ann", role: "planner", ownOrganisationName: "Acme Fill", appUrl: "http://x" });
    expect(same.text).toContain("already has an account with Acme Fill: you need no invite");
  });
  it("kit notices say which kit, when, what happened and where to fix it", () => {
    const lost = kitLostItemMail({ to: "p@b.example", job: "Main St", kitDate: "2026-12-10", today: "2026-12-09", itemDescription: "Chain, grade 70, 3/8 in", tagCode: "AB12-CD34", reporterName: "Yara", note: "bent link", link: "http://x/kits/k" });
    expect(lost.subject).toBe("Kit for Main St tomorrow lost an item: AB12-CD34 tagged out");
    expect(lost.text).toContain("in the kit for Main St tomorrow (2026-12-10)");
    expect(lost.text).toContain("Note: bent link");
    expect(kitLostItemMail({ ...{ to: "p", job: "J", kitDate: "2026-12-09", today: "2026-12-09", itemDescription: "d", tagCode: "T", reporterName: "Y", note: null, link: "l" } }).subject).toContain("today");
    const check = kitCheckMail({ to: "p@b.example", job: "Main St", kitDate: "2026-12-10", machine: "Unit 12 mini excavator", trailer: "Tilt 1", reasons: ["Needs 4 tiedowns."], link: "http://x/kits/k" });
    expect(check.text).toContain("- Needs 4 tiedowns.");
    expect(check.text).toContain("no substitute for the driver's own inspection");
  });
  it("adds a reminder's own way out: a footer link and the RFC 8058 one-click headers", () => {
    const m = withUnsubscribe({ to: "a@b.example", subject: "S", text: "Body" }, { what: "the daily digest", why: "you are an owner at Acme", pageLink: "http://x/unsubscribe/t", oneClickLink: "http://x/api/v1/unsubscribe/t", preferencesLink: "http://x/preferences" });
    expect(m.text).toBe("Body\n\n--\nYou get the daily digest because you are an owner at Acme.\nStop the daily digest: http://x/unsubscribe/t\nChoose what Linkyard e-mails you: http://x/preferences");
    expect(m.headers).toEqual({ "List-Unsubscribe": "<http://x/api/v1/unsubscribe/t>", "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" });
  });
  describe("tag-out mail", () => {
    const base = { to: "o@b.example", reporterName: "Dell", itemDescription: "Chain, grade 70, 3/8 in", tagCode: "K7XM-3HQA", link: "http://x/items/1" };
    it("says a direct tag-out was a damage report, not a pre-use check", () => {
      const m = damageReportMail({ ...base, defects: [], note: "Link gouged near the hook", cause: "report" });
      expect(m.text).toContain("Dell reported damage on Chain, grade 70, 3/8 in, tag K7XM-3HQA, and tagged it out.");
      expect(m.text).toContain("What is wrong: Link gouged near the hook");
      expect(m.text).not.toMatch(/pre-use check/);
    });
    it("says a failed pre-use check found defects, and lists them", () => {
      const m = damageReportMail({ ...base, defects: ["End hooks opened, bent or twisted"], note: null });
      expect(m.text).toContain("Dell's pre-use check of Chain, grade 70, 3/8 in, tag K7XM-3HQA, found defects, and the item was tagged out.");
      expect(m.text).toContain("- End hooks opened, bent or twisted");
    });
    it("takes a report without defects as a damage report when the cause is not given", () => {
      expect(damageReportMail({ ...base, defects: [], note: "Bent" }).text).toMatch(/^Dell reported damage/);
    });
  });
});
