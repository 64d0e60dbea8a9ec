import type { Config } from "tailwindcss";

// Craquelure's own palette: fired-clay ink, glaze cream, kiln terracotta, verdigris.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#1f2a30", soft: "#3b4a52", faint: "#6b7a82" },
        glaze: { DEFAULT: "#f7f3ea", deep: "#ece5d6", line: "#d9cfbb" },
        kiln: { DEFAULT: "#b4532a", dark: "#8c3d1d", light: "#f3d9cb" },
        verdigris: { DEFAULT: "#2f7a74", dark: "#225a55", light: "#d3ebe8" },
        // Soft warnings (plausible-range notes): a glaze ochre, readable on cream.
        ochre: { DEFAULT: "#c08a12", dark: "#7a5608", light: "#f5e6c4" },
      },
      fontFamily: {
        display: ["var(--font-display)", "system-ui", "sans-serif"],
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
      },
    },
  },
};

export default config;
