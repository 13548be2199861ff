import type { Config } from "tailwindcss";
import { asphalt, conditionTheme, groove } from "./lib/visual/tokens";

// Fourpatch's own design tokens come from lib/visual/tokens.ts (shared with the
// e-mails, the chart and the icons). Condition colours always travel with a
// shape and a word (components/ui/condition-badge.tsx), never alone.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./emails/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        asphalt,
        groove,
        condition: conditionTheme,
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      fontSize: {
        // A type scale that stays readable on a phone held at arm's length.
        xs: ["0.8125rem", { lineHeight: "1.15rem" }],
        sm: ["0.9375rem", { lineHeight: "1.35rem" }],
        base: ["1.0625rem", { lineHeight: "1.6rem" }],
        lg: ["1.25rem", { lineHeight: "1.75rem" }],
        xl: ["1.5rem", { lineHeight: "2rem" }],
        "2xl": ["1.875rem", { lineHeight: "2.3rem" }],
        "3xl": ["2.375rem", { lineHeight: "2.75rem" }],
      },
      borderRadius: {
        sm: "0.25rem",
        DEFAULT: "0.5rem",
        lg: "0.75rem",
        xl: "1.25rem",
      },
      boxShadow: {
        card: "0 1px 2px rgb(16 19 22 / 0.06), 0 2px 8px rgb(16 19 22 / 0.06)",
      },
    },
  },
  plugins: [],
};

export default config;
