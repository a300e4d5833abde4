import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { mono, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Ironquill — programmes written as text, loads worked for every athlete", template: "%s · Ironquill" },
  description:
    "Strength coaches write training programmes in a compact text notation; Ironquill turns them into each athlete's dated sessions with loads rounded to their own plates.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1c2128" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-dvh font-sans">{children}</body>
    </html>
  );
}
