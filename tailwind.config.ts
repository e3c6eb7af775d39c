import type { Config } from "tailwindcss";

// The drafting-table palette: paper, ink, graphite lines and one accent for what the user touches.
// Each colour is a CSS variable of three RGB channels (app/globals.css), light or dark with the
// operating system, so opacity modifiers (`bg-ink/30`) keep working in both themes.
const token = (name: string) => `rgb(var(--${name}) / <alpha-value>)`;

export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./canvas/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: token("paper"), deep: token("paper-deep"), card: token("paper-card"), field: token("paper-field") },
        ink: { DEFAULT: token("ink"), soft: token("ink-soft"), faint: token("ink-faint") },
        rule: { DEFAULT: token("rule"), soft: token("rule-soft") },
        accent: { DEFAULT: token("accent"), soft: token("accent-soft"), deep: token("accent-deep") },
        reaction: { DEFAULT: token("reaction"), soft: token("reaction-soft") },
        caution: { DEFAULT: token("caution"), soft: token("caution-soft") },
        // text on a filled accent or caution (white on the light theme's deep colours, paper on the dark's bright ones)
        "on-accent": token("on-accent"),
        // what a shadow or a dialog's backdrop darkens with
        shade: token("shade"),
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
      },
    },
  },
} satisfies Config;
