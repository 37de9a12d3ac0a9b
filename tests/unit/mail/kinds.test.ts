import { describe, expect, it } from "vitest";
import { isReminderKind, receivesByRole, reminderKindsFor } from "@/lib/mail/kinds";

describe("who a reminder is for", () => {
  it("sends tag-outs and the digest to owners and designated people, kit notices to owners and planners", () => {
    expect(reminderKindsFor({ role: "owner", designated: false })).toEqual(["tag_out", "kit", "digest"]);
    expect(reminderKindsFor({ role: "planner", designated: false })).toEqual(["kit"]);
    expect(reminderKindsFor({ role: "planner", designated: true })).toEqual(["tag_out", "kit", "digest"]);
    expect(reminderKindsFor({ role: "yard_hand", designated: true })).toEqual(["tag_out", "digest"]);
    expect(reminderKindsFor({ role: "yard_hand", designated: false })).toEqual([]);
    expect(receivesByRole({ role: "yard_hand", designated: false }, "tag_out")).toBe(false);
  });
  it("knows the reminder kinds, and no account e-mail among them", () => {
    expect(isReminderKind("kit")).toBe(true);
    expect(isReminderKind("password_reset")).toBe(false);
    expect(isReminderKind(undefined)).toBe(false);
  });
});
