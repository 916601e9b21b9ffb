import type { Config } from "tailwindcss";

// Rootbench's own palette: workshop paper, ink, a copper accent, moss for good news, amber for cautions.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f5f0", deep: "#ece8df" },
        ink: { DEFAULT: "#1c2430", soft: "#4a5463", faint: "#8a93a0" },
        copper: { DEFAULT: "#b4532a", dark: "#8f3f1f", light: "#f3dccf" },
        moss: { DEFAULT: "#3f7d4e", light: "#dcebdf" },
        amber: { DEFAULT: "#a86f08", light: "#fbefd2" },
        danger: { DEFAULT: "#b3261e", light: "#f8dcd9" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
