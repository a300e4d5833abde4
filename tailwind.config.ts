import type { Config } from "tailwindcss";

// Ironquill's own palette: chalk paper, iron ink, an ember accent for actions,
// moss for done, brass for highlights. Named for the gym floor, not borrowed.
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        chalk: { DEFAULT: "#f5f3ee", 50: "#fbfaf7", 100: "#f5f3ee", 200: "#e9e5dc", 300: "#d8d2c5" },
        iron: { DEFAULT: "#1c2128", 900: "#14181d", 800: "#1c2128", 700: "#2d3440", 600: "#434b58", 500: "#5b6472", 400: "#7f8793", 300: "#a8afb9", 200: "#cdd1d7", 100: "#e6e8eb" },
        ember: { DEFAULT: "#c4562b", 700: "#8f3b1b", 600: "#a8461f", 500: "#c4562b", 400: "#d9774f", 100: "#f6e1d6", 50: "#fbf1eb" },
        moss: { DEFAULT: "#2f6f5e", 700: "#1f4d41", 500: "#2f6f5e", 100: "#d9ebe5" },
        brass: { DEFAULT: "#b8892b", 500: "#b8892b", 100: "#f3e8cf" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
} satisfies Config;
