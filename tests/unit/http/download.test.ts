import { describe, expect, it } from "vitest";
import { csvDownloadHeaders, storedFileHeaders } from "@/lib/http/download";

describe("csvDownloadHeaders", () => {
  it("saves a CSV under a plain name, with the UTF-8 name beside it, never cached", () => {
    expect(csvDownloadHeaders("stock é.csv")).toEqual({
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": "attachment; filename=\"stock _.csv\"; filename*=UTF-8''stock%20%C3%A9.csv",
      "Cache-Control": "private, no-store",
      "Content-Security-Policy": "sandbox",
    });
  });

  it("keeps quotes and line breaks out of the header", () => {
    const disposition = csvDownloadHeaders('a"b\r\nc.csv')["Content-Disposition"];
    expect(disposition).toMatch(/^attachment; filename="a_b__c\.csv"; /);
    expect(disposition).not.toMatch(/[\r\n]/);
  });
});

describe("issue 11.10: stored files are sandboxed (storedFileHeaders)", () => {
  it("saves a certificate and shows a photo, both sandboxed", () => {
    expect(storedFileHeaders({ contentType: "application/pdf", originalName: 'cert "1"\r\n.pdf' })).toEqual({
      "Content-Type": "application/pdf",
      "Content-Disposition": 'attachment; filename="cert _1___.pdf"',
      "Content-Security-Policy": "sandbox",
      "X-Content-Type-Options": "nosniff",
    });
    expect(storedFileHeaders({ contentType: "image/jpeg", originalName: "bent.jpg" })["Content-Disposition"]).toBe('inline; filename="bent.jpg"');
  });
});
