import localFont from "next/font/local";

// Shipped with the app from @fontsource packages: nothing is fetched at build or run time.
export const textFont = localFont({
  src: [
    { path: "../../public/fonts/atkinson-hyperlegible-next-latin-wght-normal.woff2", style: "normal", weight: "200 800" },
    { path: "../../public/fonts/atkinson-hyperlegible-next-latin-wght-italic.woff2", style: "italic", weight: "200 800" },
  ],
  variable: "--font-text",
  display: "swap",
});

export const measureFont = localFont({
  src: [{ path: "../../public/fonts/atkinson-hyperlegible-mono-latin-wght-normal.woff2", style: "normal", weight: "200 800" }],
  variable: "--font-measure",
  display: "swap",
  // Measurements are never the first thing painted: preloading this face too only slows the page's
  // own CSS and text face on a phone connection; it is fetched when the first measure is laid out.
  preload: false,
});
