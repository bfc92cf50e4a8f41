import type { Config } from "tailwindcss";

// Sprintwright's own identity: warm paper, deep ink, a clay accent taken from a track surface,
// and a lane-line teal. One colour, one meaning (DEVELOPERS.md, "Colour tokens"): clay is the brand and the
// primary action, lane teal is "you can act here" (links, focus, drop target), kind-* name block kinds (always
// with their code, components/ui/kind-mark.tsx), flag-* name load flags (always with their shape and label,
// components/ui/flag-mark.tsx), state-* name a session's state. Text shades from ink-400 up are at least 4.5:1
// on every paper background (tests/unit/ui/colour-tokens.test.ts).
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
          400: "#59697f",
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
        // Load flags (lib/load/flag-display.ts maps each flag kind to one of these and to a shape).
        flag: {
          spike: "#b4232f",
          "spike-soft": "#fbe6e7",
          climb: "#8f5200",
          "climb-soft": "#fdf0db",
          under: "#2f6f9f",
          "under-soft": "#e3eff8",
          jump: "#b0430c",
          "jump-soft": "#fcebe0",
          monotony: "#5f6b21",
          "monotony-soft": "#eff2dc",
          contacts: "#a1246a",
          "contacts-soft": "#f9e4ef",
          recovery: "#4f46a5",
          "recovery-soft": "#ebe9f8",
          steady: "#2f6b3d",
          "steady-soft": "#e4f2e7",
          note: "#6b5ca5",
          "note-soft": "#eeebf8",
        },
        // Block kinds (components/ui/kind-mark.tsx: the fill behind the kind's code, white text on it).
        kind: {
          acceleration: { DEFAULT: "#1f6b3a", soft: "#e3f1e7" },
          "max-velocity": { DEFAULT: "#1e4f8f", soft: "#e2ebf7" },
          "speed-endurance": { DEFAULT: "#6a2c8a", soft: "#f1e6f6" },
          plyometric: { DEFAULT: "#8a4b0f", soft: "#f6ebdd" },
          tempo: { DEFAULT: "#0e6577", soft: "#ddf0f3" },
          strength: { DEFAULT: "#3f3a36", soft: "#ebe8e5" },
          recovery: { DEFAULT: "#6b6256", soft: "#efece7" },
        },
        // A physio restriction (a card past one, an athlete's chip, the hits before a drop): always a dashed border,
        // the ⚕ mark and words.
        limit: { DEFAULT: "#7a2e5c", soft: "#f7e8f1" },
        // Forms: a refused field or save (with role="alert" and words) and a save that went through.
        form: { error: "#a31b3c", "error-soft": "#fbe7ec", ok: "#24663f", "ok-soft": "#e6f3ea" },
        // A session's state: published is a filled ink dot, draft a hollow ring (plus the word, never colour alone).
        state: { published: "#2b384b", draft: "#59697f" },
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
