// The light and dark palettes of app/globals.css: every pair of text and background the pages use
// reads at WCAG 2.x AA, every token the Tailwind config names is defined in both, print keeps the
// light one, and the tray's icons map every colour a symbol is drawn in onto the tokens.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import * as palette from "@/canvas/render/palette";
import config from "@/tailwind.config";

const css = readFileSync(join(process.cwd(), "app/globals.css"), "utf8");

type Channels = [number, number, number];

/** The `--name: r g b;` declarations of the first rule after `selector`. */
function variables(selector: string): Record<string, Channels> {
  const at = css.indexOf(selector);
  if (at < 0) throw new Error(`no ${selector} in globals.css`);
  const body = css.slice(css.indexOf("{", at) + 1, css.indexOf("}", at));
  const out: Record<string, Channels> = {};
  for (const m of body.matchAll(/--([a-z0-9-]+):\s*(\d+)\s+(\d+)\s+(\d+);/g)) out[m[1]] = [Number(m[2]), Number(m[3]), Number(m[4])];
  return out;
}

const LIGHT = variables(":root,\n.paper-sheet");
const DARK = variables("@media screen and (prefers-color-scheme: dark)");

/** Relative luminance, WCAG 2.x definition (W3C, WCAG 2.2, "relative luminance"; sRGB linearisation with the 0.03928 knee as written there). */
function luminance([r, g, b]: Channels): number {
  const lin = (c: number) => {
    const s = c / 255;
    return s <= 0.03928 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
}

/** Contrast ratio (L1 + 0.05) / (L2 + 0.05), WCAG 2.x "contrast ratio". */
function contrast(a: Channels, b: Channels): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

const hex = (h: string): Channels => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16)) as Channels;

// text token → the backgrounds it is written on in the app (body text: every one needs 4.5:1)
const TEXT_ON: Array<[string, string[]]> = [
  ["ink", ["paper", "paper-deep", "paper-card", "paper-field", "accent-soft", "reaction-soft", "caution-soft"]],
  ["ink-soft", ["paper", "paper-deep", "paper-card", "paper-field", "accent-soft", "caution-soft"]],
  ["ink-faint", ["paper", "paper-deep", "paper-card", "paper-field"]],
  ["accent", ["paper", "paper-card"]],
  ["accent-deep", ["paper", "paper-deep", "paper-card", "accent-soft"]],
  ["reaction", ["paper", "paper-deep", "paper-card", "reaction-soft"]],
  ["caution", ["paper", "paper-card", "caution-soft"]],
  // inverted chips and primary buttons (bg-ink text-paper, hover bg-ink-soft, disabled bg-ink-faint)
  ["paper", ["ink", "ink-soft", "ink-faint"]],
  // filled accent buttons (hover accent-deep) and the caution badges
  ["on-accent", ["accent", "accent-deep", "caution"]],
];

describe("the palettes meet WCAG 2.x AA for body text (4.5:1, WCAG 2.2 success criterion 1.4.3)", () => {
  for (const [name, theme] of [
    ["light", LIGHT],
    ["dark", DARK],
  ] as const) {
    it(`${name}: every text token on every background it is used on`, () => {
      const short: string[] = [];
      for (const [fg, bgs] of TEXT_ON) {
        for (const bg of bgs) {
          const ratio = contrast(theme[fg], theme[bg]);
          if (ratio < 4.5) short.push(`${fg} on ${bg}: ${ratio.toFixed(2)}`);
        }
      }
      expect(short).toEqual([]);
    });
  }

  it("the formula gives the known end points: black on white is 21:1, a colour on itself 1:1 (WCAG 2.2, contrast ratio)", () => {
    expect(contrast([0, 0, 0], [255, 255, 255])).toBeCloseTo(21, 10);
    expect(contrast([29, 35, 41], [29, 35, 41])).toBe(1);
    // light ink on light paper, the pair the whole product is written in (worked by hand: about 14.3:1)
    expect(contrast(LIGHT.ink, LIGHT.paper)).toBeCloseTo(14.31, 1);
  });
});

describe("the dark palette", () => {
  it("is a dark page with light ink, not pure black", () => {
    expect(luminance(DARK.paper)).toBeLessThan(0.05);
    expect(DARK.paper).not.toEqual([0, 0, 0]);
    expect(luminance(DARK.ink)).toBeGreaterThan(0.6);
    // cards sit lighter than the page, recessed surfaces darker, as the light theme's do the other way round
    expect(luminance(DARK["paper-card"])).toBeGreaterThan(luminance(DARK.paper));
    expect(luminance(DARK["paper-deep"])).toBeLessThan(luminance(DARK.paper));
  });

  it("keeps the accent a terracotta: red the largest channel, then green, then blue, in both themes", () => {
    for (const [r, g, b] of [LIGHT.accent, DARK.accent]) {
      expect(r).toBeGreaterThan(g);
      expect(g).toBeGreaterThan(b);
    }
  });

  it("defines every variable the light palette does, and no other", () => {
    expect(Object.keys(DARK).sort()).toEqual(Object.keys(LIGHT).sort());
  });

  it("applies to screens only, so print and the PDF keep the light sheet", () => {
    expect(css).not.toMatch(/@media\s*\(prefers-color-scheme:\s*dark\)/);
    expect(css).toMatch(/@media screen and \(prefers-color-scheme: dark\)\s*\{\s*:root\s*\{\s*color-scheme: dark;/);
    expect(css).toMatch(/:root,\n\.paper-sheet \{\n\s*color-scheme: light;/);
  });
});

describe("the Tailwind tokens", () => {
  it("are all CSS variables with an opacity slot, each one defined in both themes", () => {
    const colors = config.theme.extend.colors as Record<string, string | Record<string, string>>;
    const values = Object.values(colors).flatMap((v) => (typeof v === "string" ? [v] : Object.values(v)));
    expect(values.length).toBeGreaterThan(15);
    for (const v of values) {
      const m = /^rgb\(var\(--([a-z-]+)\) \/ <alpha-value>\)$/.exec(v);
      expect(m, v).not.toBeNull();
      expect(LIGHT[m![1]], m![1]).toBeDefined();
      expect(DARK[m![1]], m![1]).toBeDefined();
    }
  });

  it("keep the light theme's colours exactly as the drawings' palette has them", () => {
    expect(LIGHT.ink).toEqual(hex(palette.INK));
    expect(LIGHT["ink-soft"]).toEqual(hex(palette.INK_SOFT));
    expect(LIGHT["ink-faint"]).toEqual(hex(palette.INK_FAINT));
    expect(LIGHT.paper).toEqual(hex(palette.PAPER));
    expect(LIGHT["paper-card"]).toEqual(hex(palette.PAPER_CARD));
    expect(LIGHT.rule).toEqual(hex(palette.RULE));
    expect(LIGHT.accent).toEqual(hex(palette.ACCENT));
    expect(LIGHT["accent-soft"]).toEqual(hex(palette.ACCENT_SOFT));
    expect(LIGHT.reaction).toEqual(hex(palette.REACTION));
    expect(LIGHT.caution).toEqual(hex(palette.CAUTION));
    expect(LIGHT["symbol-fill"]).toEqual(hex(palette.BODY_FILL));
  });
});

describe("icons drawn on the page (.drawn-in-ink)", () => {
  const symbolColours = { INK: "ink", INK_SOFT: "ink-soft", INK_FAINT: "ink-faint", PAPER_CARD: "paper-card", BODY_FILL: "symbol-fill", ACCENT: "accent", REACTION: "reaction", CAUTION: "caution" } as const;
  for (const [constant, token] of Object.entries(symbolColours)) {
    it(`map ${constant} onto --${token} as a stroke and as a fill`, () => {
      const h = palette[constant as keyof typeof symbolColours];
      expect(css).toContain(`.drawn-in-ink [stroke="${h}"] { stroke: rgb(var(--${token})); }`);
      expect(css).toContain(`.drawn-in-ink [fill="${h}"] { fill: rgb(var(--${token})); }`);
    });
  }
});

describe("the page's colour scheme before the stylesheet loads (app/layout.tsx)", () => {
  const layout = readFileSync(join(process.cwd(), "app/layout.tsx"), "utf8");
  const toHex = (c: Channels) => `#${c.map((x) => x.toString(16).padStart(2, "0")).join("")}`;

  it("declares both schemes, and tints the browser bar with each palette's paper", () => {
    expect(layout).toContain('colorScheme: "light dark"');
    expect(layout).toContain(`{ media: "(prefers-color-scheme: light)", color: "${toHex(LIGHT.paper)}" }`);
    expect(layout).toContain(`{ media: "(prefers-color-scheme: dark)", color: "${toHex(DARK.paper)}" }`);
  });
});
