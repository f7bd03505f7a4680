import withSerwistInit from "@serwist/next";

// Headers with one value for every response: pages, route handlers, redirects, 404s and the
// build's static files. The Content-Security-Policy of pages and route handlers carries a
// per-request nonce and is set in middleware.ts; static files, which middleware does not see,
// get the strict one here.
const permissionsPolicy = [
  // Photos are taken through file inputs, which need no permission; nothing else is used.
  "accelerometer=()", "autoplay=()", "camera=()", "display-capture=()", "encrypted-media=()",
  "fullscreen=()", "geolocation=()", "gyroscope=()", "hid=()", "idle-detection=()", "magnetometer=()",
  "microphone=()", "midi=()", "payment=()", "picture-in-picture=()", "publickey-credentials-get=()",
  "screen-wake-lock=()", "serial=()", "usb=()", "xr-spatial-tracking=()", "browsing-topics=()",
].join(", ");

export const SECURITY_HEADERS = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: permissionsPolicy },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

export const STATIC_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/** @type {import('next').NextConfig} */
const nextConfig = {
  // A separate build folder per concurrent worker (NEXT_DIST_DIR=.next-e2e …); .next by default.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["better-sqlite3", "pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
  eslint: { ignoreDuringBuilds: true },
  typescript: { ignoreBuildErrors: true },
  // No allowedOrigins: server actions keep the framework's own same-origin check (Origin vs Host).
  // NEXT_SERVER_MINIFY=0 keeps server function names readable in CPU profiles (npm run bench:http with
  // BENCH_CPU_PROF); production builds are minified.
  experimental: { serverActions: { bodySizeLimit: "12mb" }, serverMinification: process.env.NEXT_SERVER_MINIFY !== "0" },
  async headers() {
    return [
      { source: "/:path*", headers: SECURITY_HEADERS },
      // Only over https (a browser ignores it over http anyway); the proxy in front says which.
      { source: "/:path*", has: [{ type: "header", key: "x-forwarded-proto", value: "https" }], headers: [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }] },
      { source: "/_next/static/:path*", headers: [{ key: "Content-Security-Policy", value: STATIC_CSP }] },
      { source: "/_next/image", headers: [{ key: "Content-Security-Policy", value: STATIC_CSP }] },
    ];
  },
};
// Ramp mode's service worker (app/sw.ts → public/sw.js, see DEVELOPERS.md "Ramp mode"). Registered by
// components/ramp/ramp-mode.tsx in production builds only; `next dev` builds none.
const withSerwist = withSerwistInit({
  swSrc: "app/sw.ts",
  swDest: "public/sw.js",
  register: false,
  reloadOnOnline: false,
  cacheOnNavigation: false,
  // Off in `next dev` only (the browser tests build with NODE_ENV=test and need the worker).
  disable: process.env.NODE_ENV === "development",
  // The icons and the offline page from public/ (the worker itself is never in its own list).
  globPublicPatterns: ["**/*.{png,svg,html,webmanifest}"],
  exclude: [/\.map$/, /^build-manifest\.json$/, /react-loadable-manifest\.json$/],
});

export default withSerwist(nextConfig);
