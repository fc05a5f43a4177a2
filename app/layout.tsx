import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { measureFont, textFont, textItalicFont } from "@/components/shell/fonts";
import { SiteFooter } from "@/components/shell/site-footer";
import { SiteHeader } from "@/components/shell/site-header";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Sixteenths", template: "%s · Sixteenths" },
  description: "Layout math for carpentry classes: lessons, calculators, graded practice and a gradebook.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f6f3ea" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${textFont.variable} ${textItalicFont.variable} ${measureFont.variable}`}>
      <body className="flex min-h-dvh flex-col">
        <a href="#main" data-chrome className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-ink focus:p-3 focus:text-paper">
          Skip to content
        </a>
        <SiteHeader />
        <main id="main" className="mx-auto w-full max-w-page flex-1 px-4 py-8">
          {children}
        </main>
        <SiteFooter />
      </body>
    </html>
  );
}
