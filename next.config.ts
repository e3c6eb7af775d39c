import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The test run builds into its own folder so it never clobbers the build `npm start` serves.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // Native or file-reading packages stay out of the server bundle.
  serverExternalPackages: ["pg", "pdfkit", "sharp", "svg-to-pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
