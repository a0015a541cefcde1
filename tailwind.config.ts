import type { Config } from "tailwindcss";

/**
 * Rungwise theme tokens. Colours point at CSS variables (app/globals.css) so light and dark share one
 * set of class names: chalk paper, ink text, moss for action, ember for progress and attention.
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: "var(--paper)",
        surface: "var(--surface)",
        sunken: "var(--sunken)",
        ink: "var(--ink)",
        muted: "var(--muted)",
        line: "var(--line)",
        moss: { DEFAULT: "var(--moss)", strong: "var(--moss-strong)", soft: "var(--moss-soft)" },
        ember: { DEFAULT: "var(--ember)", soft: "var(--ember-soft)" },
        danger: { DEFAULT: "var(--danger)", soft: "var(--danger-soft)" },
        sky: { DEFAULT: "var(--sky)", soft: "var(--sky-soft)" },
      },
      fontFamily: {
        display: ["var(--font-display)", "system-ui", "sans-serif"],
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      borderRadius: { card: "14px" },
      boxShadow: { card: "0 1px 0 var(--line), 0 6px 20px -12px rgb(28 35 33 / 0.25)" },
    },
  },
};

export default config;
