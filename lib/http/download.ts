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
 * A CSV file streamed as it is read: a byte-order mark and the header line at once (so the
 * download starts), then each chunk of lines as the database gives it. A failure after the
 * start can only cut the file short; it is logged with `what`. When the client goes away the
 * chunks are closed, which ends the database cursor behind them.
 * @example csvDownload("stock.csv", "Tag code\r\n", lines(), "stock") // Response streaming the file
 */
export function csvDownload(name: string, header: string, chunks: AsyncGenerator<string>, what: string): Response {
  const encoder = new TextEncoder();
  let started = false;
  const stream = new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (!started) {
        started = true;
        controller.enqueue(encoder.encode("\ufeff" + header));
        return;
      }
      try {
        const next = await chunks.next();
        if (next.done) controller.close();
        else controller.enqueue(encoder.encode(next.value));
      } catch (error) {
        console.error(`${what} export failed`, error);
        controller.error(error);
      }
    },
    async cancel() {
      await chunks.return(undefined);
    },
  });
  return new Response(stream, { headers: csvDownloadHeaders(name) });
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
