import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import { mono, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Hangarline", template: "%s · Hangarline" },
  description: "Operations portal for flying clubs: aircraft status, maintenance, members, safety and money.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1f4e5f" };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // The framework puts this request's CSP nonce (middleware.ts) on its scripts. Reading the
  // request here renders every page per request: a page prerendered at build time would carry
  // no nonce and its scripts would be blocked.
  await headers();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-dvh">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
