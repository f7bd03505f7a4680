/** @type {import('next').NextConfig} */
const nextConfig = {
  // A separate build folder per concurrent worker (NEXT_DIST_DIR=.next-e2e …); .next by default.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["better-sqlite3", "pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
  eslint: { ignoreDuringBuilds: true },
  typescript: { ignoreBuildErrors: true },
  experimental: { serverActions: { bodySizeLimit: "12mb" } },
};
export default nextConfig;
