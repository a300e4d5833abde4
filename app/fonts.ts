import localFont from "next/font/local";

// Shipped in the repo (assets/fonts, OFL / Apache licensed) so builds never fetch fonts.
export const sans = localFont({
  src: [
    { path: "../assets/fonts/Inter-Regular.otf", weight: "400", style: "normal" },
    { path: "../assets/fonts/Inter-Medium.otf", weight: "500", style: "normal" },
    { path: "../assets/fonts/Inter-SemiBold.otf", weight: "600", style: "normal" },
    { path: "../assets/fonts/Inter-Bold.otf", weight: "700", style: "normal" },
  ],
  variable: "--font-sans",
  display: "swap",
});

export const mono = localFont({
  src: [
    { path: "../assets/fonts/JetBrainsMono-Regular.ttf", weight: "400", style: "normal" },
    { path: "../assets/fonts/JetBrainsMono-Bold.ttf", weight: "700", style: "normal" },
  ],
  variable: "--font-mono",
  display: "swap",
});
