import type { Metadata, Viewport } from "next";
import "./globals.css";
import { bodyFont, displayFont } from "./fonts";

export const metadata: Metadata = {
  title: { default: "Warmstead", template: "%s · Warmstead" },
  description: "One record per house for home-performance companies, from intake to test-out.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1f5444" };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${bodyFont.variable} ${displayFont.variable}`}>
      <body className="min-h-screen bg-paper text-charcoal">{children}</body>
    </html>
  );
}
