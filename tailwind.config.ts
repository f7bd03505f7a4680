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
        // Aircraft status: our own four, told apart by glyph and border as much as by hue
        // (never a green / amber / red set): open sky, dusk violet, hangar-door plum, fog slate.
        sky: { 50: "#eef6fb", 100: "#d9ecf6", 600: "#1d6a93", 800: "#0f4461" },
        dusk: { 50: "#f4f0fa", 100: "#e7ddf4", 600: "#6a43a8", 800: "#442a70" },
        plum: { 50: "#fbeff4", 100: "#f4d9e5", 600: "#8e2356", 800: "#5c1236" },
        fog: { 50: "#f3f4f4", 100: "#e3e6e7", 600: "#56646b", 800: "#2f3a40" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
