import type { Config } from "tailwindcss";

// Linkyard's own palette, made for sunlight: dark ink on white, a deep harbour blue for the
// app's frame and its main actions, a pale sky blue to mark what is chosen or open, and
// status colours that are never used without a word and a mark beside them: green means
// "may be used", red means stop. Every text colour here reads at 7:1 or better on white
// (WCAG AAA) and on its own pale tint; white reads at 7:1 or better on each solid colour.
// Type: Atkinson Hyperlegible Next (letters that cannot be mistaken for one another) and its
// mono cut for tag codes.
export default {
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#111827", soft: "#374151", faint: "#4b5563" },
        /** The app's frame (top bar, side column, bottom bar) and the main action of a screen. */
        deck: { DEFAULT: "#1b2f5e", light: "#2a4480" },
        /** What is chosen, open or selected: a pale tint under dark ink, or light words on the frame. */
        signal: { DEFAULT: "#cfe3ff", dark: "#a9ccf7" },
        ok: { DEFAULT: "#15603a", bg: "#ecfdf3" },
        stop: { DEFAULT: "#9b1c1c", bg: "#fef2f2" },
        caution: { DEFAULT: "#7c3a0a", bg: "#fef3c7" },
        idle: { DEFAULT: "#374151", bg: "#e5e7eb" },
      },
      fontFamily: {
        sans: ["var(--font-reading)", '"Atkinson Hyperlegible Next"', "system-ui", "Segoe UI", "Arial", "sans-serif"],
        mono: ["var(--font-codes)", '"Atkinson Hyperlegible Mono"', "ui-monospace", "Menlo", "Consolas", "monospace"],
      },
      minHeight: { tap: "3rem" },
      minWidth: { tap: "3rem" },
    },
  },
} satisfies Config;
