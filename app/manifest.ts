import type { MetadataRoute } from "next";

// Installable on a phone (ramp mode, DEVELOPERS.md). Our own colours: tail-fin teal (the
// theme colour in app/layout.tsx) over hangar-floor sand. Icons ship in public/icons.
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/",
    name: "Hangarline",
    short_name: "Hangarline",
    description: "Your flying club's aircraft status, squawks, preflight and weight and balance — also on the ramp with no signal.",
    start_url: "/clubs",
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: "#f3f1ea",
    theme_color: "#1f4e5f",
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/maskable-192.png", sizes: "192x192", type: "image/png", purpose: "maskable" },
      { src: "/icons/maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
      { src: "/icons/hangarline.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
    ],
  };
}
