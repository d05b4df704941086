import type { Config } from "tailwindcss";

// Roostline's palette: "dusk" (the hour the door must close) for actions,
// "straw" for highlights, "ember" for danger, "meadow" for healthy states.
const config: Config = {
  darkMode: "class",
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/**/*.ts"],
  theme: {
    extend: {
      fontFamily: {
        sans: ["var(--font-sans)", "ui-sans-serif", "system-ui", "sans-serif"],
        mono: ["ui-monospace", "SFMono-Regular", "Menlo", "monospace"],
      },
      fontSize: {
        // A 1.2 (minor third) scale from a 15 px body.
        xs: ["0.75rem", { lineHeight: "1.1rem" }],
        sm: ["0.8125rem", { lineHeight: "1.25rem" }],
        base: ["0.9375rem", { lineHeight: "1.5rem" }],
        lg: ["1.125rem", { lineHeight: "1.65rem" }],
        xl: ["1.35rem", { lineHeight: "1.85rem" }],
        "2xl": ["1.62rem", { lineHeight: "2.1rem" }],
        "3xl": ["1.94rem", { lineHeight: "2.4rem" }],
      },
    },
  },
};

export default config;
