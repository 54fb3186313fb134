import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import { BrowserZodConfig } from "@/components/ui/browser-zod-config";
import "./globals.css";

// Inter ships with the app from an npm font package; nothing is fetched at build or run time.
const inter = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  variable: "--font-inter",
  display: "swap",
  weight: "100 900",
});

export const metadata: Metadata = {
  title: { default: "Pierwise", template: "%s · Pierwise" },
  description:
    "Preliminary wind-load and footing sizing for ground-mounted solar arrays, with licensed-engineer review and a field spec for the crew.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request, so Next.js can put that request's CSP nonce (proxy.ts) on its scripts.
  await connection();
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans">
        <BrowserZodConfig />
        {children}
      </body>
    </html>
  );
}
