import type { Config } from "tailwindcss";

// Hangarline's own palette: hangar-floor sand, deep tail-fin teal, windsock orange for attention.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        sand: { 50: "#faf8f2", 100: "#f3f1ea", 200: "#e6e1d3", 300: "#d9d4c5", 500: "#a39c88" },
        fin: { 500: "#2f6e82", 600: "#1f4e5f", 700: "#173b48", 900: "#0e2630" },
        ink: { 500: "#5b6b73", 700: "#34444d", 900: "#1d2a33" },
        sock: { 100: "#fde9d6", 500: "#d9731f", 700: "#9c4d0f" },
        go: { 100: "#dcefe2", 600: "#2d7a4a", 800: "#1c5132" },
        stop: { 100: "#f7dede", 600: "#b3312f", 800: "#7a1f1d" },
        ask: { 100: "#e6e4f4", 600: "#5a4fa3", 800: "#3a3270" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
