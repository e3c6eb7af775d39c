import localFont from "next/font/local";

// Inter, shipped from the inter-ui npm package (full glyph set: Σ, μ, ṁ, Δ, θ, ρ are all there).
export const sans = localFont({
  src: [
    { path: "../node_modules/inter-ui/web/Inter-Regular.woff2", weight: "400", style: "normal" },
    { path: "../node_modules/inter-ui/web/Inter-Medium.woff2", weight: "500", style: "normal" },
    { path: "../node_modules/inter-ui/web/Inter-SemiBold.woff2", weight: "600", style: "normal" },
    { path: "../node_modules/inter-ui/web/Inter-Bold.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-sans",
  display: "swap",
});
