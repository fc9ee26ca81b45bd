import type { Config } from "tailwindcss";

// Filmsheet's design tokens. Colours are CSS variables (app/globals.css) that switch between the
// light and dark themes, so components name a role ("surface", "heat") and never a raw colour.
const color = (name: string) => `var(--fs-${name})`;

const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        canvas: color("canvas"), // page background
        surface: color("surface"), // cards, panels, the header
        sunken: color("sunken"), // wells, table stripes, code
        line: color("line"), // hairlines and borders
        ink: color("ink"), // body text
        muted: color("muted"), // secondary text
        accent: { DEFAULT: color("accent"), ink: color("accent-ink"), soft: color("accent-soft") },
        heat: color("heat"), // heat gain, warm surfaces
        frost: color("frost"), // heat loss, cold surfaces
        ok: color("ok"), // accepted rows
        caution: color("caution"), // warnings, out-of-range correlations
        danger: color("danger"), // errors, queried rows
      },
      fontFamily: {
        sans: ["var(--font-inter)", "ui-sans-serif", "system-ui", "sans-serif"],
        mono: ["ui-monospace", "SFMono-Regular", "Menlo", "monospace"],
      },
      // Type scale (ratio ≈ 1.2 from a 15 px body, tuned for dense engineering tables).
      fontSize: {
        micro: ["0.6875rem", { lineHeight: "1rem", letterSpacing: "0.02em" }],
        small: ["0.8125rem", { lineHeight: "1.25rem" }],
        body: ["0.9375rem", { lineHeight: "1.5rem" }],
        lead: ["1.125rem", { lineHeight: "1.75rem" }],
        title: ["1.375rem", { lineHeight: "1.875rem", letterSpacing: "-0.01em" }],
        headline: ["1.75rem", { lineHeight: "2.25rem", letterSpacing: "-0.015em" }],
        display: ["2.5rem", { lineHeight: "2.875rem", letterSpacing: "-0.025em" }],
      },
      // Named layout spacing on top of the 4 px grid.
      spacing: {
        gutter: "1.5rem",
        rail: "13.5rem",
        bar: "3.5rem",
      },
      borderRadius: {
        chip: "0.375rem",
        panel: "0.75rem",
      },
      boxShadow: {
        panel: "0 1px 0 var(--fs-line), 0 6px 18px -12px var(--fs-shadow)",
      },
      maxWidth: {
        prose: "42rem",
        page: "80rem",
      },
    },
  },
};

export default config;
