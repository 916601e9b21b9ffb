import type { Metadata } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import { currentSession } from "@/lib/auth/session";
import "./globals.css";

const sans = localFont({
  src: [
    { path: "./fonts/inter-latin-400-normal.woff2", weight: "400" },
    { path: "./fonts/inter-latin-500-normal.woff2", weight: "500" },
    { path: "./fonts/inter-latin-600-normal.woff2", weight: "600" },
    { path: "./fonts/inter-latin-700-normal.woff2", weight: "700" },
  ],
  variable: "--font-sans",
  display: "swap",
});
const mono = localFont({ src: "./fonts/jetbrains-mono-latin-400-normal.woff2", variable: "--font-mono", display: "swap" });

export const metadata: Metadata = {
  title: { default: "Rootbench", template: "%s · Rootbench" },
  description: "Triage, bench records and shared knowledge for drive-unit repair workshops.",
  icons: { icon: [{ url: "/favicon.ico", sizes: "any" }, { url: "/icon.svg", type: "image/svg+xml" }] },
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request, so each carries the nonce of its own Content-Security-Policy.
  await connection();
  const theme = (await currentSession())?.theme;
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`} data-theme={theme === "dark" ? "dark" : undefined}>
      <body>{children}</body>
    </html>
  );
}
