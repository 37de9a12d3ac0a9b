import { describe, expect, it } from "vitest";
import { CAMERA_MESSAGES, cameraProblem } from "@/lib/tags/camera";

describe("camera problems", () => {
  it("recognise a refusal", () => {
    expect(cameraProblem(new DOMException("Permission denied", "NotAllowedError"))).toBe("denied");
    expect(cameraProblem("Error getting userMedia, error = NotAllowedError: Permission denied")).toBe("denied");
  });

  it("recognise a missing camera", () => {
    expect(cameraProblem(new DOMException("Requested device not found", "NotFoundError"))).toBe("none");
    expect(cameraProblem("Error getting userMedia, error = NotFoundError: Requested device not found")).toBe("none");
    expect(cameraProblem({ name: "OverconstrainedError" })).toBe("none");
  });

  it("recognise a camera in use, a browser without camera access, and the rest", () => {
    expect(cameraProblem(new DOMException("Could not start video source", "NotReadableError"))).toBe("busy");
    expect(cameraProblem("Camera streaming not supported by the browser.")).toBe("unsupported");
    expect(cameraProblem(new Error("boom"))).toBe("other");
    expect(cameraProblem(undefined)).toBe("other");
  });

  it("always point to typing the code", () => {
    for (const message of Object.values(CAMERA_MESSAGES)) expect(message).toMatch(/type the code/i);
  });
});
