// The root document: local fonts, metadata and client providers. Each route group's layout
// adds the app shell (components/shell).
import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import "./globals.css";

// Both fonts come from npm packages; nothing is downloaded at build or run time.
const inter = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  weight: "100 900",
  style: "normal",
  display: "swap",
  variable: "--font-inter",
});

const fraunces = localFont({
  src: "../node_modules/@fontsource-variable/fraunces/files/fraunces-latin-opsz-normal.woff2",
  weight: "100 900",
  style: "normal",
  display: "swap",
  variable: "--font-fraunces",
});

export const metadata: Metadata = {
  title: { default: "Ribbonry — quilt shows, from entry to ribbon", template: "%s · Ribbonry" },
  description:
    "Ribbonry runs quilt shows: online entries, the intake desk, blind judging on tablets and published results.",
  applicationName: "Ribbonry",
};

export const viewport: Viewport = {
  themeColor: "#28133e",
  width: "device-width",
  initialScale: 1,
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${inter.variable} ${fraunces.variable}`}>
      <body className="flex min-h-dvh flex-col antialiased">
        <a
          href="#main"
          className="sr-only z-50 rounded-control bg-gold-300 px-4 py-3 font-semibold text-plum-950 focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
        >
          Skip to main content
        </a>
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
