import type { Config } from "tailwindcss";

// Linkyard's own palette: dark ink on white for sunlight, a signal yellow for action,
// and status colours that are never used without a word beside them.
export default {
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#111827", soft: "#374151", faint: "#6b7280" },
        deck: { DEFAULT: "#1d2b3a", light: "#2c3e50" },
        signal: { DEFAULT: "#ffc21a", dark: "#d99a00" },
        ok: { DEFAULT: "#166534", bg: "#dcfce7" },
        stop: { DEFAULT: "#b91c1c", bg: "#fee2e2" },
        caution: { DEFAULT: "#92400e", bg: "#fef3c7" },
        idle: { DEFAULT: "#374151", bg: "#e5e7eb" },
      },
      fontFamily: {
        sans: ['"Roboto Condensed"', "Arial Narrow", "Arial", "sans-serif"],
      },
      minHeight: { tap: "3rem" },
      minWidth: { tap: "3rem" },
    },
  },
} satisfies Config;
