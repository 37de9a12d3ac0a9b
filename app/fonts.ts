import localFont from "next/font/local";

// The reading faces, through next/font so that the page asks for them with its HTML
// (preloaded, not found only after the stylesheet) and shows a fallback sized to match them:
// a weak phone signal gets words on screen sooner and nothing moves when the face arrives.
// Latin only here (next/font wants literal paths); the @fontsource stylesheets in the root
// layout still cover the other Latin letters (names like Łukasz), fetched only when shown.
export const reading = localFont({
  src: [
    { path: "../node_modules/@fontsource/atkinson-hyperlegible-next/files/atkinson-hyperlegible-next-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../node_modules/@fontsource/atkinson-hyperlegible-next/files/atkinson-hyperlegible-next-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-reading",
  display: "swap",
});

export const codes = localFont({
  src: [
    { path: "../node_modules/@fontsource/atkinson-hyperlegible-mono/files/atkinson-hyperlegible-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../node_modules/@fontsource/atkinson-hyperlegible-mono/files/atkinson-hyperlegible-mono-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-codes",
  display: "swap",
  preload: false, // tag codes only: not worth a weak signal's first bytes
  adjustFontFallback: false,
  fallback: ["ui-monospace", "Menlo", "Consolas", "monospace"],
});
