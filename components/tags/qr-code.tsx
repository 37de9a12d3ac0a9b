import { qrSymbol } from "@/lib/tags/qr";

/** A QR symbol as inline SVG, sized by its container; black on white, crisp edges. */
export function QrCode({ text, label, className }: { text: string; label: string; className?: string }) {
  const { size, path } = qrSymbol(text);
  return (
    <svg
      viewBox={`0 0 ${size} ${size}`}
      shapeRendering="crispEdges"
      role="img"
      aria-label={label}
      className={className}
      xmlns="http://www.w3.org/2000/svg"
    >
      <rect width={size} height={size} fill="#fff" />
      <path fill="#000" d={path} />
    </svg>
  );
}
