import QRCode from "qrcode";
import { config } from "@/lib/config";

// What a QR tag encodes, and the QR symbol itself as SVG. Tags live outdoors on chains and
// binders: they get scuffed, greased and half covered by mud, so the symbol uses error
// correction level Q (about 25 % of the symbol can be lost and still read; level M is about
// 15 %), and a quiet zone of 4 modules as the QR specification asks (ISO/IEC 18004).

/** Error correction level of every tag: Q. */
export const TAG_QR_LEVEL = "Q" as const;
/** Light modules around the symbol, on every side. */
export const QR_QUIET_ZONE = 4;

/**
 * The address a tag's QR code opens: the public tag resolver.
 * @example tagUrl("K7XM-3HQA", "https://yard.example.com/") // "https://yard.example.com/t/K7XM-3HQA"
 */
export function tagUrl(tagCode: string, baseUrl: string = config.APP_URL): string {
  return `${baseUrl.replace(/\/+$/, "")}/t/${tagCode}`;
}

export interface QrSymbol {
  /** Side of the square in modules, quiet zone included (the SVG viewBox is 0 0 size size). */
  size: number;
  /** QR version (1–40); 3 or 4 for a tag URL. */
  version: number;
  /** SVG path data: one rectangle per run of dark modules in a row. */
  path: string;
}

/**
 * A QR symbol as SVG path data, in module units. Pure: same text, same symbol.
 * @example qrSymbol("http://127.0.0.1:3000/t/K7XM-3HQA").size // 37 (29 modules and the quiet zone)
 */
export function qrSymbol(
  text: string,
  options: { level?: "M" | "Q"; quietZone?: number } = {},
): QrSymbol {
  const level = options.level ?? TAG_QR_LEVEL;
  const quiet = options.quietZone ?? QR_QUIET_ZONE;
  const qr = QRCode.create(text, { errorCorrectionLevel: level });
  const n = qr.modules.size;
  const data = qr.modules.data;
  let path = "";
  for (let row = 0; row < n; row++) {
    let col = 0;
    while (col < n) {
      if (!data[row * n + col]) {
        col++;
        continue;
      }
      const start = col;
      while (col < n && data[row * n + col]) col++;
      path += `M${start + quiet} ${row + quiet}h${col - start}v1h-${col - start}z`;
    }
  }
  return { size: n + 2 * quiet, version: qr.version, path };
}

/**
 * A complete SVG document of a QR symbol: black on white, crisp edges, scalable.
 * @example qrSvg("K7XM-3HQA").startsWith("<svg") // true
 */
export function qrSvg(text: string, options: { level?: "M" | "Q"; quietZone?: number; title?: string } = {}): string {
  const { size, path } = qrSymbol(text, options);
  const title = options.title ? `<title>${escapeXml(options.title)}</title>` : "";
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${size} ${size}" shape-rendering="crispEdges">` +
    `${title}<rect width="${size}" height="${size}" fill="#fff"/><path fill="#000" d="${path}"/></svg>`
  );
}

/**
 * The SVG QR code of one tag.
 * @example tagQrSvg("K7XM-3HQA") // "<svg …>" encoding `${APP_URL}/t/K7XM-3HQA`
 */
export function tagQrSvg(tagCode: string, baseUrl?: string): string {
  return qrSvg(tagUrl(tagCode, baseUrl), { title: `QR tag ${tagCode}` });
}

function escapeXml(text: string): string {
  return text.replace(/[<>&"']/g, (c) => ({ "<": "&lt;", ">": "&gt;", "&": "&amp;", '"': "&quot;", "'": "&apos;" })[c]!);
}
