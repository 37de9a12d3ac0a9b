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
  };
}
