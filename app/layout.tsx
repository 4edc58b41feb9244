import type { Metadata } from "next";
import { cookies } from "next/headers";
import { mono, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Deepshift", template: "%s · Deepshift" },
  description: "Run record, data quality, exposure, limits and safety review for the Kestrin Deep Site",
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  const theme = (await cookies()).get("theme")?.value === "day" ? "day" : "night";
  return (
    <html lang="en" data-theme={theme} className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen font-sans text-[15px] antialiased">{children}</body>
    </html>
  );
}
