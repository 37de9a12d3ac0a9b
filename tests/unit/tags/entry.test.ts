import { describe, expect, it } from "vitest";
import { codeFromScan, readTypedTagCode, tagCodeFromPath } from "@/lib/tags/entry";

describe("scanned text", () => {
  it("takes the code from a tag URL, whatever the address", () => {
    expect(codeFromScan("http://127.0.0.1:3300/t/K7XM-3HQA")).toBe("K7XM-3HQA");
    expect(codeFromScan("https://yard.example.com/t/k7xm3hqa/")).toBe("K7XM-3HQA");
    expect(codeFromScan("https://yard.example.com/t/K7XM%203HQA")).toBe("K7XM-3HQA");
  });

  it("takes a bare code", () => {
    expect(codeFromScan(" K7XM-3HQA ")).toBe("K7XM-3HQA");
  });

  it("refuses anything else", () => {
    expect(codeFromScan("https://yard.example.com/items/K7XM-3HQA")).toBeNull();
    expect(codeFromScan("https://yard.example.com/t/NOPE")).toBeNull();
    expect(codeFromScan("https://yard.example.com/t/%E0%A4%A")).toBeNull();
    expect(codeFromScan("WIFI:S:yard;T:WPA;P:x;;")).toBeNull();
    expect(codeFromScan("")).toBeNull();
  });
});

describe("typed codes", () => {
  it("accept any case, spaces and dashes", () => {
    expect(readTypedTagCode("k7xm 3hqa")).toEqual({ ok: true, code: "K7XM-3HQA" });
    expect(readTypedTagCode("K7-XM-3H-QA")).toEqual({ ok: true, code: "K7XM-3HQA" });
  });

  it("accept a pasted tag URL", () => {
    expect(readTypedTagCode("https://yard.example.com/t/K7XM-3HQA")).toEqual({ ok: true, code: "K7XM-3HQA" });
  });

  it("say what is wrong, in words", () => {
    expect(readTypedTagCode("  ")).toEqual({ ok: false, message: "Type the code printed under the QR code." });
    expect(readTypedTagCode("K7XM-3HQ")).toEqual({ ok: false, message: "A tag code has 8 characters, like K7XM-3HQA; this has 7." });
    const zero = readTypedTagCode("K7XM-3HQ0");
    expect(zero.ok).toBe(false);
    expect(!zero.ok && zero.message).toBe("Tag codes never use 0. Check the code on the tag again.");
    const several = readTypedTagCode("o1l5-3hqa");
    expect(!several.ok && several.message).toMatch(/^Tag codes never use O, 1, L or 5\./);
  });
});

describe("codes in a URL path", () => {
  it("are decoded and normalised", () => {
    expect(tagCodeFromPath("K7XM-3HQA")).toBe("K7XM-3HQA");
    expect(tagCodeFromPath("k7xm%203hqa")).toBe("K7XM-3HQA");
    expect(tagCodeFromPath("%E0%A4%A")).toBeNull();
    expect(tagCodeFromPath("[code]")).toBeNull();
  });
});
