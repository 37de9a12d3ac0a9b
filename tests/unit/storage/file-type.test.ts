import { describe, expect, it } from "vitest";
import { sniffContentType, uploadProblem } from "@/lib/storage/file-type";

const bytes = (...b: number[]) => new Uint8Array([...b, ...new Array(16).fill(0)]);
const JPEG = bytes(0xff, 0xd8, 0xff, 0xe0);
const PNG = bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a);
const PDF = bytes(0x25, 0x50, 0x44, 0x46, 0x2d, 0x31);
const WEBP = new Uint8Array([0x52, 0x49, 0x46, 0x46, 1, 2, 3, 4, 0x57, 0x45, 0x42, 0x50]);
const EXE = bytes(0x4d, 0x5a);

describe("file types", () => {
  it("are read from the bytes", () => {
    expect(sniffContentType(JPEG)).toBe("image/jpeg");
    expect(sniffContentType(PNG)).toBe("image/png");
    expect(sniffContentType(PDF)).toBe("application/pdf");
    expect(sniffContentType(WEBP)).toBe("image/webp");
    expect(sniffContentType(EXE)).toBeNull();
  });
  it("and sizes limit what is stored", () => {
    expect(uploadProblem("damage-photo", 1000, JPEG)).toBeNull();
    expect(uploadProblem("damage-photo", 1000, PDF)).toBe("This file is not a JPEG, PNG or WebP photo up to 8 MB.");
    expect(uploadProblem("certificate", 1000, PDF)).toBeNull();
    expect(uploadProblem("damage-photo", 9 * 1024 * 1024, JPEG)).toBe("The file is 9.0 MB; send a JPEG, PNG or WebP photo up to 8 MB.");
    expect(uploadProblem("certificate", 0, PDF)).toBe("The file is empty.");
  });
});
