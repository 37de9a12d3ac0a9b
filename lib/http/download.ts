// Headers of a file the browser saves rather than shows.

/**
 * Download headers for a CSV file with a name people recognise (ASCII, with the UTF-8 name beside it).
 * @example csvDownloadHeaders("stock é.csv")["Content-Disposition"] // 'attachment; filename="stock _.csv"; filename*=UTF-8\'\'stock%20%C3%A9.csv'
 */
export function csvDownloadHeaders(name: string): Record<string, string> {
  const plain = name.replace(/[^\w.\- ]/g, "_").slice(0, 120) || "file.csv";
  return {
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="${plain}"; filename*=UTF-8''${encodeURIComponent(name.slice(0, 120))}`,
    "Cache-Control": "private, no-store",
    "Content-Security-Policy": "sandbox",
  };
}

/**
 * Headers of a stored photo or certificate. Whatever the file holds, it is never a page of
 * this site: a sandbox CSP gives it no origin and no scripts. A photo is shown in place; any
 * other file (a PDF certificate) is saved, as a sandboxed PDF would not open anyway.
 * @example storedFileHeaders({ contentType: "application/pdf", originalName: 'cert "1".pdf' })["Content-Disposition"] // 'attachment; filename="cert _1_.pdf"'
 */
export function storedFileHeaders(file: { contentType: string; originalName: string }): Record<string, string> {
  const plain = file.originalName.replace(/[^\w.\- ]/g, "_").slice(0, 120) || "file";
  return {
    "Content-Type": file.contentType,
    "Content-Disposition": `${file.contentType.startsWith("image/") ? "inline" : "attachment"}; filename="${plain}"`,
    "Content-Security-Policy": "sandbox",
    "X-Content-Type-Options": "nosniff",
  };
}
