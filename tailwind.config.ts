import type { Config } from "tailwindcss";

// Fourpatch's own design tokens. Condition colours always travel with a word
// (see components/ui/condition-badge.tsx), never alone.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./emails/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        // Neutrals: the grey of worn asphalt.
        asphalt: {
          50: "#f6f7f8",
          100: "#eceef1",
          200: "#d5d9df",
          300: "#b1b8c2",
          400: "#86909e",
          500: "#677282",
          600: "#525b69",
          700: "#434a56",
          800: "#2c3139",
          900: "#1b1f24",
          950: "#101316",
        },
        // Brand: a deep teal, the colour of the patch stamp.
        groove: {
          50: "#effaf8",
          100: "#d7f2ed",
          200: "#afe4db",
          300: "#7dcfc3",
          400: "#4bb3a6",
          500: "#2d978b",
          600: "#217a71",
          700: "#1e625c",
          800: "#1c4f4b",
          900: "#1a423f",
          950: "#0a2624",
        },
        condition: {
          good: "#1f7a3d",
          "good-bg": "#e3f4e8",
          watch: "#7a5b00",
          "watch-bg": "#fdf3c7",
          plan: "#a04a00",
          "plan-bg": "#ffe6d1",
          replace: "#b3141b",
          "replace-bg": "#fde2e2",
        },
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
