import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { themeScript } from "@/components/shell/theme";
import { getViewer } from "@/server/auth/get-viewer";
import { signOutAction, switchFirmAction } from "./(auth)/actions";
import "./globals.css";

// Inter (variable weight), shipped in the repository: builds never reach the internet.
const inter = localFont({
  src: "./fonts/inter-latin-wght-normal.woff2",
  weight: "100 900",
  style: "normal",
  variable: "--font-inter",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Filmsheet", template: "%s · Filmsheet" },
  description: "Outside film coefficients, surface temperatures, U-values and heat flows for building-services schedules.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#fdfcfa" },
    { media: "(prefers-color-scheme: dark)", color: "#181c22" },
  ],
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  const viewer = await getViewer();
  // The CSP nonce proxy.ts gave this request: the one inline script must carry it to run.
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  const shell = viewer ? { user: viewer.user, firm: viewer.actor?.firm, firms: viewer.actor?.firms ?? [] } : null;
  return (
    // The theme script sets data-theme before hydration, hence suppressHydrationWarning.
    <html lang="en" className={inter.variable} suppressHydrationWarning>
      <head>
        <script nonce={nonce} dangerouslySetInnerHTML={{ __html: themeScript }} />
      </head>
      <body>
        <AppShell viewer={shell} signOut={signOutAction} switchFirm={switchFirmAction}>
          {children}
        </AppShell>
      </body>
    </html>
  );
}
