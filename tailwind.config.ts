import type { Config } from "tailwindcss";

// The drafting-table palette: paper, ink, graphite lines and one accent for what the user touches.
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./canvas/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f3ec", deep: "#ece7dc", card: "#fbfaf6" },
        ink: { DEFAULT: "#1d2329", soft: "#3d4650", faint: "#5f6974" },
        rule: { DEFAULT: "#cfc8b8", soft: "#e2dccf" },
        accent: { DEFAULT: "#b4462b", soft: "#f3ddd3", deep: "#8c3520" },
        reaction: { DEFAULT: "#1f5f7a", soft: "#dcebf1" },
        caution: { DEFAULT: "#8a6212", soft: "#f6ebcf" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
      },
    },
  },
} satisfies Config;
