import type { Config } from "tailwindcss";

// Sprintwright's own identity: warm paper, deep ink, a clay accent taken from a track surface,
// and a lane-line teal. Flag colours are separate tokens so they never collide with the brand.
const config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f5f1", raised: "#ffffff", sunk: "#efebe4" },
        ink: {
          50: "#f3f5f8",
          100: "#e3e8ef",
          200: "#c5cfdc",
          300: "#9aa9bd",
          400: "#6b7f99",
          500: "#4d607a",
          600: "#3a4a61",
          700: "#2b384b",
          800: "#1d2736",
          900: "#121a25",
          950: "#0b111a",
        },
        clay: {
          50: "#fdf3ef",
          100: "#fae2d8",
          200: "#f3c0ac",
          300: "#e99a7d",
          400: "#dc7352",
          500: "#c9573a",
          600: "#a9442d",
          700: "#863525",
          800: "#622820",
          900: "#431d18",
        },
        lane: {
          50: "#eef8f6",
          100: "#d3eee8",
          200: "#a6dbd1",
          300: "#72c2b4",
          400: "#44a594",
          500: "#2a8879",
          600: "#1f6d62",
          700: "#1b5750",
          800: "#184642",
          900: "#143a37",
        },
        flag: {
          spike: "#b4232f",
          "spike-soft": "#fbe6e7",
          climb: "#b86a09",
          "climb-soft": "#fdf0db",
          under: "#2f6f9f",
          "under-soft": "#e3eff8",
          steady: "#3c7a4a",
          "steady-soft": "#e4f2e7",
          note: "#6b5ca5",
          "note-soft": "#eeebf8",
        },
      },
      fontFamily: {
        sans: ["Inter", "ui-sans-serif", "system-ui", "sans-serif"],
        mono: ["ui-monospace", "SFMono-Regular", "Menlo", "monospace"],
      },
      fontSize: {
        "2xs": ["0.6875rem", { lineHeight: "1rem" }],
        xs: ["0.75rem", { lineHeight: "1.1rem" }],
        sm: ["0.875rem", { lineHeight: "1.35rem" }],
        base: ["1rem", { lineHeight: "1.55rem" }],
        lg: ["1.125rem", { lineHeight: "1.7rem" }],
        xl: ["1.375rem", { lineHeight: "1.9rem", letterSpacing: "-0.01em" }],
        "2xl": ["1.75rem", { lineHeight: "2.2rem", letterSpacing: "-0.015em" }],
        "3xl": ["2.25rem", { lineHeight: "2.6rem", letterSpacing: "-0.02em" }],
        "4xl": ["3rem", { lineHeight: "3.3rem", letterSpacing: "-0.025em" }],
      },
      borderRadius: { card: "0.875rem" },
      boxShadow: {
        card: "0 1px 2px rgba(11,17,26,0.06), 0 1px 1px rgba(11,17,26,0.04)",
        lift: "0 10px 30px -12px rgba(11,17,26,0.35)",
      },
    },
  },
} satisfies Config;

export default config;
