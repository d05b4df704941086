import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { headers } from "next/headers";
import "./globals.css";

const sans = localFont({
  src: "../fonts/InterVariable-latin.woff2",
  variable: "--font-sans",
  weight: "100 900",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Roostline", template: "%s · Roostline" },
  description: "Reviewed, versioned parameter profiles for poultry pop-hole door controllers.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f7f6f3" },
    { media: "(prefers-color-scheme: dark)", color: "#121110" },
  ],
};

// Applies the saved theme before first paint, so a dark-theme user never sees a light flash.
const themeScript = `try{var t=localStorage.getItem("roostline-theme");var d=t==="dark"||(t!=="light"&&matchMedia("(prefers-color-scheme: dark)").matches);document.documentElement.classList.toggle("dark",d)}catch(e){}`;

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // The content security policy's nonce for this response, set by proxy.ts (every page renders per request).
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  return (
    <html lang="en" className={sans.variable} suppressHydrationWarning>
      <head>
        <script nonce={nonce} dangerouslySetInnerHTML={{ __html: themeScript }} />
      </head>
      <body className="min-h-screen font-sans">{children}</body>
    </html>
  );
}
