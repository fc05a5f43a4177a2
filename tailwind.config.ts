import type { Config } from "tailwindcss";

// Design tokens for a workshop classroom: paper, pencil-dark ink, and one accent —
// the blue of a snapped chalk line. Caution amber is reserved for safety notes.
const config: Config = {
  content: ["./app/**/*.{ts,tsx,mdx}", "./components/**/*.{ts,tsx}", "./content/**/*.mdx", "./mdx-components.tsx"],
  theme: {
    extend: {
      colors: {
        paper: {
          DEFAULT: "#f6f3ea",
          raised: "#fffdf7",
          sunk: "#ece7da",
        },
        ink: {
          DEFAULT: "#1d1b18",
          soft: "#4a463f",
          faint: "#6b665c",
        },
        rule: {
          DEFAULT: "#d6cfbf",
          strong: "#a9a08c",
          // The edge of a text box: 3:1 against the paper around it, so the box can be found (WCAG 1.4.11).
          field: "#8a8170",
        },
        chalk: {
          DEFAULT: "#1f58a8",
          dark: "#17427f",
          light: "#dce7f6",
        },
        caution: {
          DEFAULT: "#8a5a00",
          bg: "#fdf1d6",
          edge: "#e0b34a",
        },
        danger: {
          DEFAULT: "#a12a1f",
          bg: "#fbe6e2",
        },
        ok: {
          DEFAULT: "#2f6b35",
          bg: "#e3f1e2",
        },
      },
      fontFamily: {
        sans: ["var(--font-text)", "system-ui", "sans-serif"],
        mono: ["var(--font-measure)", "ui-monospace", "monospace"],
      },
      fontSize: {
        xs: ["0.8125rem", { lineHeight: "1.25rem" }],
        sm: ["0.9375rem", { lineHeight: "1.375rem" }],
        base: ["1.0625rem", { lineHeight: "1.65rem" }],
        lg: ["1.25rem", { lineHeight: "1.75rem" }],
        xl: ["1.5rem", { lineHeight: "2rem" }],
        "2xl": ["1.875rem", { lineHeight: "2.25rem" }],
        "3xl": ["2.375rem", { lineHeight: "2.75rem" }],
      },
      borderRadius: {
        sm: "3px",
        DEFAULT: "6px",
        lg: "10px",
      },
      minHeight: {
        touch: "44px",
      },
      minWidth: {
        touch: "44px",
      },
      maxWidth: {
        page: "72rem",
        prose: "42rem",
      },
    },
  },
};

export default config;
