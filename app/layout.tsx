import "@fontsource/inter/400.css";
import "@fontsource/inter/500.css";
import "@fontsource/inter/600.css";
import "@fontsource/inter/700.css";
import "./globals.css";
import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import type { ReactNode } from "react";

export const metadata: Metadata = {
  title: { default: "Sprintwright", template: "%s · Sprintwright" },
  description:
    "Plan speed training week by week, keep sprint and plyometric load progressive, and keep the physio in the loop.",
};

export const viewport: Viewport = { themeColor: "#121a25", width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page renders per request: its scripts carry the nonce of that request's Content-Security-Policy
  // (proxy.ts); a page prerendered at build time would have none and be blocked.
  await connection();
  return (
    <html lang="en">
      <body className="min-h-dvh font-sans">{children}</body>
    </html>
  );
}
