import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import "@fontsource/atkinson-hyperlegible-next/400.css";
import "@fontsource/atkinson-hyperlegible-next/700.css";
import "@fontsource/atkinson-hyperlegible-mono/400.css";
import "@fontsource/atkinson-hyperlegible-mono/700.css";
// The printed tag sheet keeps its narrow face, so that a label's words fit the tag.
import "@fontsource/roboto-condensed/400.css";
import "@fontsource/roboto-condensed/700.css";
import { codes, reading } from "./fonts";
import { ZodWithoutEval } from "@/components/providers/zod-without-eval";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Linkyard", template: "%s · Linkyard" },
  description: "Tiedown gear, tags, checks and securement checks for equipment hauling.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1b2f5e" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: its scripts carry that answer's CSP nonce (proxy.ts).
  await connection();
  return (
    <html lang="en" className={`${reading.variable} ${codes.variable}`}>
      <body className="min-h-dvh">
        <ZodWithoutEval />
        {children}
      </body>
    </html>
  );
}
